import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { firstRulePerField } from '../../client/first-rule-per-field';
import { formatDate } from '../../client/format-date';
import { refusalMessage } from '../../client/refusal-message';
import { serverFieldErrors } from '../../client/server-field-errors';
import { useAcceptLink } from '../../client/use-accept-link';
import { theme } from '../../constants/theme';
import type { AccountLinkView } from '../../shared/account-link-view';
import { PASSWORD_MIN_LENGTH } from '../../shared/password-min-length';
import { roleWithArticle } from '../../shared/role-with-article';
import { useLinkBody } from '../../shared/schemas/use-link-body';
import { ActionButton } from '../ui/action-button';
import { FailureAlert } from '../ui/failure-alert';
import { SkText } from '../ui/sk-text';
import { TextField } from '../ui/text-field';

/**
 * The form behind a usable one-time link: an invitation asks for a name and a password, a reset
 * for a password. Checked by the schema the server uses, plus the second copy of the password.
 */
export function JoinForm({ token, link, onDone }: { token: string; link: AccountLinkView; onDone: () => void }) {
  const invitation = link.kind === 'invitation';
  const [displayName, setDisplayName] = useState('');
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [submitted, setSubmitted] = useState(false);
  const accept = useAcceptLink();
  const body = { token, password, ...(invitation ? { displayName } : {}) };
  const checked = useLinkBody.safeParse(body);
  const rules = submitted ? firstRulePerField(checked.error) : {};
  const mismatch = submitted && again !== password ? 'must be the same password' : undefined;
  const server = serverFieldErrors(accept.error);
  const refused =
    accept.error && !Object.keys(server).length
      ? refusalMessage(accept.error, 'The server could not be reached; nothing was changed.')
      : null;

  const submit = () => {
    setSubmitted(true);
    if (!checked.success || again !== password) return;
    accept.mutate(checked.data, { onSuccess: onDone });
  };

  return (
    <View style={styles.form}>
      <SkText variant="body" style={styles.lead}>
        {invitation
          ? `${link.sentBy} invites ${link.email} to Sheetkeeper as ${roleWithArticle(link.role)}. Choose the name others will see and your password.`
          : `Choose a new password for ${link.displayName} (${link.email}). Using this link signs you out everywhere else.`}
      </SkText>
      {invitation ? (
        <TextField
          label="Your name"
          value={displayName}
          onChangeText={setDisplayName}
          error={rules.displayName ?? server.displayName}
          autoComplete="name"
          testID="join-name"
        />
      ) : null}
      <TextField
        label="New password"
        value={password}
        onChangeText={setPassword}
        error={rules.password ?? server.password}
        secureTextEntry
        autoComplete="new-password"
        placeholder={`at least ${PASSWORD_MIN_LENGTH} characters`}
        testID="join-password"
      />
      <TextField
        label="The same password again"
        value={again}
        onChangeText={setAgain}
        error={mismatch}
        secureTextEntry
        autoComplete="new-password"
        onSubmitEditing={submit}
        testID="join-password-again"
      />
      {refused ? <FailureAlert message={refused} glyph="×" /> : null}
      <SkText variant="caption">This link works once, until {formatDate(link.expiresAt)}.</SkText>
      <ActionButton
        label={invitation ? 'Make my account and sign in' : 'Set the password and sign in'}
        onPress={submit}
        busy={accept.isPending}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(4) },
  lead: { lineHeight: 24 },
});
