import { StyleSheet, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { useLiveWorkers } from '../../client/use-live-workers';
import { theme } from '../../constants/theme';
import { NO_LIVE_WORKER_WORDS, targetCountWords } from '../runs/describe-live-workers';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';

/**
 * The worker processes taking shards now (the server's own and each `npm run worker`, on any
 * machine), each with the targets it has: a pair whose target none of them has waits for one that
 * does. Asked again every 5 s while shown.
 */
export function WorkerList() {
  const workers = useLiveWorkers();
  if (workers.isPending) return <QueryState state="loading" />;
  if (workers.isError)
    return <QueryState state="error" message={workers.error.message} onRetry={() => void workers.refetch()} />;
  if (workers.data.length === 0) return <QueryState state="empty" message={NO_LIVE_WORKER_WORDS} />;
  return (
    <View testID="worker-list">
      {workers.data.map((w) => (
        <View key={w.id} style={styles.row} testID={`worker-${w.label}`}>
          <SkText variant="label">{w.label}</SkText>
          <SkText variant="caption">
            Running since {formatDate(w.startedAt)} · {targetCountWords(w.targets.length)}
          </SkText>
          <SkText variant="mono" style={styles.targets}>
            {w.targets.length > 0 ? w.targets.join(', ') : 'none: it runs no checks'}
          </SkText>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: {
    paddingVertical: theme.space(2),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
    gap: 2,
  },
  targets: { wordBreak: 'break-word' } as object,
});
