import { StyleSheet, View } from 'react-native';
import { refusalMessage } from '../../client/refusal-message';
import { formatDate } from '../../client/format-date';
import { useRevokeToken } from '../../client/use-revoke-token';
import { useTokens } from '../../client/use-tokens';
import { theme } from '../../constants/theme';
import { ACTION_ROW_STYLE } from '../ui/action-row-style';
import { ConfirmAction } from '../ui/confirm-action';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { FailureAlert } from '../ui/failure-alert';

/** My API tokens: name, first characters, made, last used, and revoke (asked twice). Revoked ones stay listed. */
export function TokenList() {
  const tokens = useTokens();
  const revoke = useRevokeToken();
  if (tokens.isPending) return <QueryState state="loading" />;
  if (tokens.isError)
    return <QueryState state="error" message={tokens.error.message} onRetry={() => void tokens.refetch()} />;
  if (tokens.data.length === 0)
    return (
      <QueryState
        state="empty"
        message="No tokens yet. Make one for each place that starts runs for you, so each can be revoked alone."
      />
    );
  const failure = refusalMessage(revoke.error, 'The server could not be reached; the token still works.');

  return (
    <View style={styles.list} testID="token-list">
      {failure ? <FailureAlert message={failure} style={styles.failure} /> : null}
      {tokens.data.map((t) => (
        <View key={t.id} style={[styles.row, t.revokedAt ? styles.revoked : null]} testID={`token-${t.name}`}>
          <View style={styles.words}>
            <SkText variant="label">{t.name}</SkText>
            <SkText variant="mono" tone="inkSoft">
              {t.prefix}…
            </SkText>
            <SkText variant="caption">
              Made {formatDate(t.createdAt)} · {t.lastUsedAt ? `last used ${formatDate(t.lastUsedAt)}` : 'never used'}
            </SkText>
            <SkText variant="smallLabel" style={!t.revokedAt && styles.active}>
              {t.revokedAt ? `− Revoked ${formatDate(t.revokedAt)}: refused by the API` : '✓ Active'}
            </SkText>
          </View>
          {t.revokedAt ? null : (
            <View style={styles.action}>
              <ConfirmAction
                label="Revoke"
                accessibilityLabel={`Revoke token ${t.name}`}
                question={`Revoke “${t.name}”? Anything using it gets “not valid” from now on.`}
                confirmLabel="Yes, revoke"
                busy={revoke.isPending && revoke.variables === t.id}
                onConfirm={() => revoke.mutate(t.id)}
              />
            </View>
          )}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  failure: { marginBottom: theme.space(2) },
  row: ACTION_ROW_STYLE,
  revoked: { opacity: 0.75 },
  words: { flexGrow: 1, flexShrink: 1, flexBasis: 200, gap: 2 },
  active: { color: theme.color.accent },
  action: { flexShrink: 0, maxWidth: '100%' },
});
