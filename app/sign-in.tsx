import { Redirect, useRouter } from 'expo-router';
import { StyleSheet, Text, View } from 'react-native';
import { useMe } from '../client/use-me';
import { QueryState } from '../components/ui/query-state';
import { SignInForm } from '../components/settings/sign-in-form';
import { theme } from '../constants/theme';

export default function SignInScreen() {
  const me = useMe();
  const router = useRouter();
  if (me.data) return <Redirect href="/" />;
  return (
    <View style={styles.page}>
      <View style={styles.card}>
        <Text style={styles.brand}>Sheetkeeper</Text>
        <Text style={styles.lead}>Branch values of complex functions, checked every night.</Text>
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
  brand: { fontFamily: theme.font.bold, fontSize: theme.size.title, color: theme.color.ink },
  lead: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.inkSoft, lineHeight: 24 },
});
