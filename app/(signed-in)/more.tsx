import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { NAV_ITEMS } from '../../client/nav-items';
import { useMe } from '../../client/use-me';
import { useSignOut } from '../../client/use-sign-out';
import { ActionButton } from '../../components/ui/action-button';
import { RoleBadge } from '../../components/settings/role-badge';
import { ScreenBody } from '../../components/ui/screen-body';
import { SkText } from '../../components/ui/sk-text';
import { theme } from '../../constants/theme';

/** The phone's "More" tab: every destination the tab bar has no room for, who I am, and sign-out. */
export default function MoreScreen() {
  const { data: user } = useMe();
  const signOut = useSignOut();
  if (!user) return null;
  const items = NAV_ITEMS.filter((item) => !item.primary && item.roles.includes(user.role));
  return (
    <ScreenBody title="More">
      <View style={styles.list}>
        {items.map((item) => (
          <Link key={item.href} href={item.href} asChild>
            <Pressable accessibilityRole="link" accessibilityLabel={item.label} style={styles.row}>
              <SkText variant="label" style={styles.label}>
                {item.label}
              </SkText>
              <SkText variant="body" tone="inkFaint">
                →
              </SkText>
            </Pressable>
          </Link>
        ))}
      </View>
      <View style={styles.who}>
        <SkText variant="label">{user.displayName}</SkText>
        <SkText variant="mono" tone="inkSoft">
          {user.email}
        </SkText>
        <RoleBadge role={user.role} />
      </View>
      <ActionButton label="Sign out" tone="quiet" busy={signOut.isPending} onPress={() => signOut.mutate()} />
    </ScreenBody>
  );
}

const styles = StyleSheet.create({
  list: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
  },
  row: {
    minHeight: 56,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(4),
    paddingHorizontal: theme.space(4),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  label: { flex: 1 },
  who: { gap: theme.space(1) },
});
