import { StyleSheet, Text, View } from 'react-native';
import { useMe } from '../../client/use-me';
import { RoleBadge } from '../../components/role-badge';
import { ScreenBody } from '../../components/screen-body';
import { theme } from '../../constants/theme';
import type { Role } from '../../shared/roles';

/** What each role does here, in one line. */
const DUTIES: Record<Role, string> = {
  admin: 'You manage who can sign in and what each person may do.',
  maintainer: 'You run nightly plans over the library versions you ship and act on regressions.',
  reviewer: 'You approve suites and classify failures: bug, convention difference or accepted deviation.',
  contributor: 'You write suites of expected branch values and submit them for review.',
};

export default function HomeScreen() {
  const { data: user } = useMe();
  if (!user) return null;
  return (
    <ScreenBody title={`Hello, ${user.displayName}`}>
      <View style={styles.card}>
        <Text style={styles.label}>Signed in as</Text>
        <Text style={styles.value} testID="home-email">
          {user.email}
        </Text>
        <RoleBadge role={user.role} />
        <Text style={styles.duty}>{DUTIES[user.role]}</Text>
      </View>
      <View style={styles.note}>
        <Text style={styles.noteText}>
          A green result in Sheetkeeper is evidence for the points, paths and conventions that a suite checked — not a certificate that a library is correct everywhere.
        </Text>
      </View>
    </ScreenBody>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: theme.color.panel, borderWidth: 1, borderColor: theme.color.rule, borderRadius: theme.radius, padding: theme.space(5), gap: theme.space(2) },
  label: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.inkFaint, textTransform: 'uppercase', letterSpacing: 0.8 },
  value: { fontFamily: theme.font.mono, fontSize: theme.size.body, color: theme.color.ink },
  duty: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.inkSoft, lineHeight: 24, marginTop: theme.space(2) },
  note: { borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(3) },
  noteText: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
});
