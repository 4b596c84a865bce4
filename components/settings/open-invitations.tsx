import { StyleSheet, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { refusalMessage } from '../../client/refusal-message';
import { useCancelInvitation } from '../../client/use-cancel-invitation';
import { useInvitations } from '../../client/use-invitations';
import { theme } from '../../constants/theme';
import { roleWithArticle } from '../../shared/role-with-article';
import { ConfirmAction } from '../ui/confirm-action';
import { FailureAlert } from '../ui/failure-alert';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';

/**
 * Who has been invited and has not joined yet: the address, the role, who sent it and until when
 * it works, and a way to withdraw it (asked first, naming the address). A withdrawn invitation
 * leaves the list, and a line under it says so; a refusal is said there too.
 */
export function OpenInvitations() {
  const invitations = useInvitations();
  const cancel = useCancelInvitation();
  const refusal = refusalMessage(cancel.error, 'The server could not be reached; the invitation still works.');
  const outcome = refusal ? (
    <FailureAlert message={refusal} glyph="×" />
  ) : cancel.data ? (
    <SkText variant="label" tone="accent" testID="invitation-cancelled">
      Invitation to {cancel.data.invitation.email} cancelled: its link no longer works.
    </SkText>
  ) : null;
  if (invitations.isPending) return <QueryState state="loading" />;
  if (invitations.isError)
    return <QueryState state="error" message={invitations.error.message} onRetry={() => void invitations.refetch()} />;
  return (
    <View style={styles.list}>
      {invitations.data.length === 0 ? (
        <SkText variant="caption">No invitation is waiting to be used.</SkText>
      ) : (
        <View style={styles.list} testID="open-invitations">
          <SkText variant="smallLabel">Waiting to be used</SkText>
          {invitations.data.map((i) => (
            <View key={i.id} style={styles.item} testID={`invitation-${i.email}`}>
              <View style={styles.words}>
                <SkText variant="mono">{i.email}</SkText>
                <SkText variant="caption">
                  as {roleWithArticle(i.role)} · sent {formatDate(i.sentAt)} by {i.sentBy} · works until{' '}
                  {formatDate(i.expiresAt)}
                </SkText>
              </View>
              <View style={styles.action}>
                <ConfirmAction
                  label="Cancel invitation"
                  accessibilityLabel={`Cancel invitation to ${i.email}`}
                  question={`Cancel the invitation to ${i.email}? Its link stops working at once; you can invite the address again later.`}
                  confirmLabel="Yes, cancel it"
                  keepLabel="Keep the invitation"
                  busy={cancel.isPending && cancel.variables === i.id}
                  onConfirm={() => cancel.mutate(i.id)}
                />
              </View>
            </View>
          ))}
        </View>
      )}
      <View accessibilityLiveRegion="polite">{outcome}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  item: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: theme.space(2),
    paddingVertical: theme.space(1),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
  },
  // Beside the button on a wide screen; above it on a phone, where the two do not fit on a line.
  words: { gap: 2, flexGrow: 1, flexShrink: 1, flexBasis: 280 },
  // Never wider than the list: the question's words wrap instead of running off a phone's edge.
  action: { maxWidth: '100%' },
});
