import { Redirect, useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { useMe } from '../client/use-me';
import { QueryState } from '../components/ui/query-state';
import { SignInForm } from '../components/settings/sign-in-form';
import { SkText } from '../components/ui/sk-text';
import { theme } from '../constants/theme';

export default function SignInScreen() {
  const me = useMe();
  const router = useRouter();
  if (me.data) return <Redirect href="/" />;
  return (
    <View style={styles.page}>
      <View style={styles.card}>
        <SkText variant="title">Sheetkeeper</SkText>
        <SkText variant="body" tone="inkSoft" style={styles.lead}>
          Branch values of complex functions, checked every night.
        </SkText>
        {me.isPending ? <QueryState state="loading" /> : <SignInForm onSignedIn={() => router.replace('/')} />}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  page: {
    flex: 1,
    backgroundColor: theme.color.paper,
    justifyContent: 'center',
    alignItems: 'center',
    padding: theme.space(4),
  },
  card: {
    width: '100%',
    maxWidth: 420,
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    padding: theme.space(6),
    gap: theme.space(5),
  },
  lead: { lineHeight: 24 },
});
