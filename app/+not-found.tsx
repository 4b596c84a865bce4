import { Link } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../constants/theme';

export default function NotFoundScreen() {
  return (
    <View style={styles.page}>
      <Text accessibilityRole="header" style={styles.title}>
        No page here
      </Text>
      <Text style={styles.text}>This address does not lead to any Sheetkeeper screen.</Text>
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
  title: { fontFamily: theme.font.bold, fontSize: theme.size.title, color: theme.color.ink },
  text: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.inkSoft, textAlign: 'center' },
  link: {
    fontFamily: theme.font.medium,
    fontSize: theme.size.body,
    color: theme.color.accent,
    textDecorationLine: 'underline',
    minHeight: 44,
    paddingTop: 12,
  },
});
