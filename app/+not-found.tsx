import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { PageTitle } from '../components/ui/page-title';
import { SkText } from '../components/ui/sk-text';
import { theme } from '../constants/theme';

export default function NotFoundScreen() {
  return (
    <View style={styles.page}>
      <PageTitle title="No page here" />
      <SkText variant="title" accessibilityRole="header">
        No page here
      </SkText>
      <SkText variant="body" tone="inkSoft" style={styles.text}>
        This address does not lead to any Sheetkeeper screen.
      </SkText>
      <Link href="/" style={styles.link}>
        Go to the home screen
      </Link>
    </View>
  );
}

const styles = StyleSheet.create({
  page: {
    flex: 1,
    backgroundColor: theme.color.paper,
    alignItems: 'center',
    justifyContent: 'center',
    gap: theme.space(3),
    padding: theme.space(6),
  },
  text: { textAlign: 'center' },
  link: {
    fontFamily: theme.font.medium,
    fontSize: theme.size.body,
    color: theme.color.accent,
    textDecorationLine: 'underline',
    minHeight: 44,
    paddingTop: 12,
  },
});
