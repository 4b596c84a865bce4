import { StyleSheet, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { refusalMessage } from '../../client/refusal-message';
import { useRemoveTargetSource } from '../../client/use-remove-target-source';
import { useTargetSources } from '../../client/use-target-sources';
import { theme } from '../../constants/theme';
import type { TargetSourceView } from '../../shared/target-source-view';
import { ACTION_ROW_STYLE } from '../ui/action-row-style';
import { ConfirmAction } from '../ui/confirm-action';
import { FailureAlert } from '../ui/failure-alert';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { targetSourceWords } from './target-source-words';

/** Each state in words with a glyph of its own, so colour never carries it alone. */
function stateWords(s: TargetSourceView): { text: string; tone: 'warn' | 'accent' | 'danger' } {
  if (s.state === 'resolving')
    return {
      text: '… Getting it ready: installing or starting it on the server. This list updates by itself.',
      tone: 'warn',
    };
  if (s.state === 'ready') return { text: `✓ Ready to plan: ${s.targetNames.join(', ')}`, tone: 'accent' };
  return { text: `× Could not be used: ${s.error ?? 'no reason was recorded'}`, tone: 'danger' };
}

/**
 * The targets admins added, newest first: kind, what it names, its state (read again every 2 s
 * while one is getting ready), who added it and when. Admins get a remove button that asks first;
 * everyone else sees the list alone.
 */
export function TargetSourceList({ canRemove }: { canRemove: boolean }) {
  const sources = useTargetSources();
  const remove = useRemoveTargetSource();
  if (sources.isPending) return <QueryState state="loading" />;
  if (sources.isError)
    return <QueryState state="error" message={sources.error.message} onRetry={() => void sources.refetch()} />;
  if (sources.data.length === 0)
    return (
      <QueryState
        state="empty"
        message={
          canRemove
            ? 'No targets added yet. Add one above: it can be planned once it is ready.'
            : 'No targets added yet. An admin can add npm versions, working copies and programs here.'
        }
      />
    );
  const failure = refusalMessage(remove.error, 'The server could not be reached; the target is still there.');

  return (
    <View testID="target-source-list">
      {failure ? <FailureAlert message={failure} style={styles.failure} /> : null}
      {sources.data.map((s) => {
        const { kind, what } = targetSourceWords(s.source);
        const state = stateWords(s);
        const label = s.source.name ?? what;
        return (
          <View key={s.id} style={styles.row} testID={`target-source-${s.id}`}>
            <View style={styles.words}>
              <SkText variant="caption" tone="inkSoft">
                {kind}
              </SkText>
              <SkText variant="mono" style={styles.what}>
                {what}
              </SkText>
              {s.source.name ? <SkText variant="caption">named {s.source.name}</SkText> : null}
              <SkText variant="smallLabel" tone={state.tone}>
                {state.text}
              </SkText>
              <SkText variant="caption" tone="inkFaint">
                Added by {s.addedBy ?? 'a user no longer here'} · {formatDate(s.addedAt)}
              </SkText>
            </View>
            {canRemove ? (
              <View style={styles.action}>
                <ConfirmAction
                  label="Remove"
                  accessibilityLabel={`Remove ${label}`}
                  question={`Remove “${label}”? Its targets become “not installed”: plans keep naming them, and past runs and failures stay.`}
                  confirmLabel="Yes, remove"
                  busy={remove.isPending && remove.variables === s.id}
                  onConfirm={() => remove.mutate(s.id)}
                />
              </View>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  failure: { marginBottom: theme.space(2) },
  row: ACTION_ROW_STYLE,
  words: { flexGrow: 1, flexShrink: 1, flexBasis: 220, gap: 2 },
  // Paths and commands have no spaces to wrap at; on a phone they break anywhere instead of overflowing.
  what: { wordBreak: 'break-all' } as object,
  action: { flexShrink: 0, maxWidth: '100%' },
});
