import { Redirect, useRouter } from 'expo-router';
import { StyleSheet } from 'react-native';
import { useMe } from '../client/use-me';
import { PageTitle } from '../components/ui/page-title';
import { QueryState } from '../components/ui/query-state';
import { SignInForm } from '../components/settings/sign-in-form';
import { SkText } from '../components/ui/sk-text';
import { CentredCard } from '../components/ui/centred-card';

export default function SignInScreen() {
  const me = useMe();
  const router = useRouter();
  if (me.data) return <Redirect href="/" />;
  return (
    <CentredCard maxWidth={420}>
      <PageTitle title="Sign in" />
      <SkText variant="title">Sheetkeeper</SkText>
      <SkText variant="body" tone="inkSoft" style={styles.lead}>
        Branch values of complex functions, checked every night.
      </SkText>
      {me.isPending ? <QueryState state="loading" /> : <SignInForm onSignedIn={() => router.replace('/')} />}
    </CentredCard>
  );
}

const styles = StyleSheet.create({
  lead: { lineHeight: 24 },
});
