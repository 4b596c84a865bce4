import { useMutationState } from '@tanstack/react-query';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { firstRulePerField } from '../../client/first-rule-per-field';
import { formatDate } from '../../client/format-date';
import { refusalMessage } from '../../client/refusal-message';
import { serverFieldErrors } from '../../client/server-field-errors';
import { CANCEL_INVITATION_KEY } from '../../client/use-cancel-invitation';
import { useInvite } from '../../client/use-invite';
import { theme } from '../../constants/theme';
import type { CancelledInvitation } from '../../shared/cancelled-invitation';
import { roleWithArticle } from '../../shared/role-with-article';
import type { Role } from '../../shared/roles';
import { inviteBody } from '../../shared/schemas/invite-body';
import { ActionButton } from '../ui/action-button';
import { ChipGroup } from '../ui/chip-group';
import { FailureAlert } from '../ui/failure-alert';
import { SkText } from '../ui/sk-text';
import { TextField } from '../ui/text-field';
import { ROLE_OPTIONS } from './role-options';

/**
 * Invites someone: an address and a role, checked by the server's own schema; the server mails a
 * one-time link (it shows in the Outbox) and the form says where it went and until when it works.
 */
export function InviteForm() {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('contributor');
  const [submitted, setSubmitted] = useState(false);
  const invite = useInvite();
  const checked = inviteBody.safeParse({ email, role });
  const rules = submitted ? firstRulePerField(checked.error) : {};
  const server = serverFieldErrors(invite.error);
  const refused =
    invite.error && !Object.keys(server).length
      ? refusalMessage(invite.error, 'The server could not be reached; no invitation was sent.')
      : null;
  // Addresses whose invitation was withdrawn, and when: "its link works once, until …" would no
  // longer be true of an invitation withdrawn after it was sent (the list below says it was).
  const withdrawals = useMutationState({
    filters: { mutationKey: CANCEL_INVITATION_KEY, status: 'success' },
    select: (m) => ({
      email: (m.state.data as { invitation: CancelledInvitation } | undefined)?.invitation.email,
      at: m.state.submittedAt,
    }),
  });
  const sent = invite.data?.invitation;
  const withdrawnSince = sent && withdrawals.some((w) => w.email === sent.email && w.at >= invite.submittedAt);

  const submit = () => {
    setSubmitted(true);
    if (!checked.success) return;
    invite.mutate(checked.data, {
      onSuccess: () => {
        setEmail('');
        setSubmitted(false);
      },
    });
  };

  return (
    <View style={styles.form} testID="invite-form">
      <TextField
        label="E-mail of the person to invite"
        value={email}
        onChangeText={(text) => {
          setEmail(text);
          if (invite.error) invite.reset();
        }}
        error={rules.email ?? server.email}
        autoComplete="off"
        keyboardType="email-address"
        autoCapitalize="none"
        onSubmitEditing={submit}
        testID="invite-email"
      />
      <ChipGroup
        label="Role"
        groupLabel="Role of the person to invite"
        options={ROLE_OPTIONS}
        value={role}
        onChange={setRole}
      />
      {refused ? <FailureAlert message={refused} glyph="×" /> : null}
      {sent && !withdrawnSince ? (
        <SkText variant="label" tone="accent" accessibilityLiveRegion="polite" testID="invite-sent">
          Invitation mailed to {sent.email} as {roleWithArticle(sent.role)}. Its link works once, until{' '}
          {formatDate(sent.expiresAt)}; the mail is in the Outbox.
        </SkText>
      ) : null}
      <View style={styles.actions}>
        <ActionButton label="Mail the invitation" onPress={submit} busy={invite.isPending} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: theme.space(3) },
  actions: { flexDirection: 'row' },
});
