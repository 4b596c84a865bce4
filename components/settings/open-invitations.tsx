import { StyleSheet, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { useInvitations } from '../../client/use-invitations';
import { theme } from '../../constants/theme';
import { roleWithArticle } from '../../shared/role-with-article';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';

/** Who has been invited and has not joined yet: the address, the role, who sent it and until when it works. */
export function OpenInvitations() {
  const invitations = useInvitations();
  if (invitations.isPending) return <QueryState state="loading" />;
  if (invitations.isError)
    return <QueryState state="error" message={invitations.error.message} onRetry={() => void invitations.refetch()} />;
  if (invitations.data.length === 0) return <SkText variant="caption">No invitation is waiting to be used.</SkText>;
  return (
    <View style={styles.list} testID="open-invitations">
      <SkText variant="smallLabel">Waiting to be used</SkText>
      {invitations.data.map((i) => (
        <View key={i.email} style={styles.item}>
          <SkText variant="mono">{i.email}</SkText>
          <SkText variant="caption">
            as {roleWithArticle(i.role)} · sent {formatDate(i.sentAt)} by {i.sentBy} · works until{' '}
            {formatDate(i.expiresAt)}
          </SkText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  item: { gap: 2, paddingVertical: theme.space(1), borderTopWidth: 1, borderTopColor: theme.color.rule },
});
