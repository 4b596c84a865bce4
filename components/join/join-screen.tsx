import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useAccountLink } from '../../client/use-account-link';
import { CentredCard } from '../ui/centred-card';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { JoinForm } from './join-form';

const NO_TOKEN =
  'This page opens from the link in an invitation or password-reset mail, and this address has no link in it. Open the link from the mail, or ask an admin of your Sheetkeeper for a new one.';

/**
 * The public page a mailed one-time link opens: the form when the link can be used, otherwise a
 * plain page that says why (unknown, used, replaced, expired, deactivated) and whom to ask.
 */
export function JoinScreen({ token, onDone }: { token: string | null; onDone: () => void }) {
  const link = useAccountLink(token);
  const heading = link.data?.kind === 'password-reset' ? 'Choose a new password' : 'Join Sheetkeeper';
  let content;
  if (token === null) content = <Unusable message={NO_TOKEN} />;
  else if (link.isPending) content = <QueryState state="loading" />;
  else if (link.isError)
    content =
      link.error instanceof ApiRequestError && link.error.status !== 503 && link.error.status < 500 ? (
        <Unusable message={link.error.body.message} />
      ) : (
        <QueryState
          state="error"
          message="The server could not be reached to check this link. Try again in a moment."
          onRetry={() => void link.refetch()}
        />
      );
  else content = <JoinForm token={token} link={link.data} onDone={onDone} />;
  return (
    <CentredCard maxWidth={480}>
      <SkText variant="title" accessibilityRole="header">
        {link.isError || token === null ? 'This link cannot be used' : heading}
      </SkText>
      {content}
    </CentredCard>
  );
}

function Unusable({ message }: { message: string }) {
  return (
    <>
      <SkText variant="body" style={styles.lead} testID="join-unusable">
        {message}
      </SkText>
      <Link href="/sign-in" asChild>
        <Pressable accessibilityRole="link" style={styles.signIn}>
          <SkText variant="label" tone="accent">
            Go to sign-in
          </SkText>
        </Pressable>
      </Link>
    </>
  );
}

const styles = StyleSheet.create({
  lead: { lineHeight: 24 },
  signIn: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
});
