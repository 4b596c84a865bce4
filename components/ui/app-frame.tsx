import { Link, usePathname } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { MORE_ITEM, NAV_ITEMS, type NavItem } from '../../client/nav-items';
import { useSignOut } from '../../client/use-sign-out';
import { theme } from '../../constants/theme';
import type { PublicUser } from '../../shared/public-user';
import { SkText } from './sk-text';

/**
 * The signed-in frame: a bottom tab bar for one-handed use below `theme.wide`,
 * a side rail with the user and sign-out from there on. Items follow the role.
 */
export function AppFrame({ user, children }: { user: PublicUser; children: ReactNode }) {
  const { width } = useWindowDimensions();
  const wide = width >= theme.wide;
  const pathname = usePathname();
  const signOut = useSignOut();
  const allowed = NAV_ITEMS.filter((item) => item.roles.includes(user.role));
  // A phone shows the primary items and "More"; the rest are active under "More" too.
  const items = wide ? allowed : [...allowed.filter((item) => item.primary), MORE_ITEM];
  const secondary = allowed.filter((item) => !item.primary).map((item) => item.href);
  const isActive = (href: string) =>
    href === '/'
      ? pathname === '/'
      : pathname.startsWith(href) || (href === MORE_ITEM.href && secondary.some((h) => pathname.startsWith(h)));

  const links = items.map((item: NavItem) => (
    <Link key={item.href} href={item.href} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={item.label}
        aria-current={isActive(item.href) ? 'page' : undefined}
        // Link's asChild merges styles as objects: hand it a flat one (an array breaks on web).
        style={StyleSheet.flatten([
          wide ? styles.railItem : styles.tabItem,
          isActive(item.href) && (wide ? styles.railItemActive : styles.tabItemActive),
        ])}
      >
        <Text style={[wide ? styles.railLabel : styles.tabLabel, isActive(item.href) && styles.activeInk]}>
          {item.label}
        </Text>
      </Pressable>
    </Link>
  ));

  // On a phone, sign-out lives on the "More" screen so the tab bar keeps five large targets.
  const signOutButton = (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel="Sign out"
      onPress={() => signOut.mutate()}
      style={wide ? styles.railItem : styles.tabItem}
    >
      <Text style={wide ? styles.railLabel : styles.tabLabel}>Sign out</Text>
    </Pressable>
  );

  if (wide) {
    return (
      <View style={styles.wideRoot}>
        <View style={styles.rail} role="navigation">
          <SkText variant="heading" tone="navActive" style={styles.brand}>
            Sheetkeeper
          </SkText>
          <View style={styles.railItems}>{links}</View>
          <View style={styles.railFoot}>
            <SkText variant="label" tone="navActive" style={styles.railUser} numberOfLines={1}>
              {user.displayName}
            </SkText>
            <SkText variant="mono" tone="navInk" style={styles.railRole}>
              {user.role}
            </SkText>
            {signOutButton}
          </View>
        </View>
        <View style={styles.main}>{children}</View>
      </View>
    );
  }
  return (
    <View style={styles.narrowRoot}>
      <View style={styles.topBar}>
        <SkText variant="heading" tone="navActive" style={styles.brand}>
          Sheetkeeper
        </SkText>
      </View>
      <View style={styles.main}>{children}</View>
      <View style={styles.tabBar} role="navigation">
        {links}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1, flexDirection: 'row', backgroundColor: theme.color.paper },
  narrowRoot: { flex: 1, backgroundColor: theme.color.paper },
  main: { flex: 1 },
  rail: {
    width: 232,
    backgroundColor: theme.color.nav,
    paddingVertical: theme.space(6),
    paddingHorizontal: theme.space(3),
  },
  brand: { paddingHorizontal: theme.space(3), letterSpacing: 0.5 },
  railItems: { marginTop: theme.space(8), gap: theme.space(1) },
  railItem: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingHorizontal: theme.space(3),
    borderRadius: theme.radius,
  },
  railItemActive: {
    backgroundColor: theme.color.navActiveGround,
    borderLeftWidth: 3,
    borderLeftColor: theme.color.focus,
  },
  railLabel: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.navInk },
  railFoot: {
    marginTop: 'auto',
    gap: theme.space(1),
    borderTopWidth: 1,
    borderTopColor: theme.color.navRule,
    paddingTop: theme.space(4),
  },
  railUser: { paddingHorizontal: theme.space(3) },
  railRole: { paddingHorizontal: theme.space(3), marginBottom: theme.space(2) },
  topBar: { backgroundColor: theme.color.nav, paddingVertical: theme.space(3) },
  tabBar: {
    flexDirection: 'row',
    backgroundColor: theme.color.nav,
    borderTopWidth: 1,
    borderTopColor: theme.color.navRule,
  },
  tabItem: { flex: 1, minHeight: 60, alignItems: 'center', justifyContent: 'center', gap: 2 },
  tabItemActive: { borderTopWidth: 3, borderTopColor: theme.color.focus },
  tabLabel: { fontFamily: theme.font.medium, fontSize: 12, color: theme.color.navInk },
  activeInk: { color: theme.color.navActive },
});
