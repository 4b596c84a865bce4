import { StyleSheet, View } from 'react-native';
import { describeRegressions } from './describe-regressions';
import { isLiveRun } from '../../client/is-live-run';
import { theme } from '../../constants/theme';
import type { RunView } from '../../shared/run-view';
import { SkText } from '../ui/sk-text';
import { formatWhen } from './format-when';
import { OutcomeCounts } from './outcome-counts';
import { ProgressBar } from './progress-bar';
import { runDuration } from './run-duration';
import { RunStatusBadge } from './run-status-badge';
import { triggerWords } from './trigger-words';
import { waitingForWorkerWords } from './waiting-for-worker-words';
import { LinkCard } from '../ui/link-card';

/** One run as a card (phones, and the Overview): plan, status, who and when, counts; progress while live, and pairs waiting for a worker. Opens the run. */
export function RunCard({ run, now }: { run: RunView; now?: number }) {
  const live = isLiveRun(run);
  return (
    <LinkCard href={`/runs/${run.id}`} testID={`run-${run.id}`}>
      <View style={styles.head}>
        <SkText variant="label" style={styles.plan} numberOfLines={2}>
          {run.planName}
        </SkText>
        <SkText variant="body" tone="inkFaint">
          →
        </SkText>
      </View>
      <RunStatusBadge run={run} />
      <SkText variant="caption">
        {triggerWords(run.trigger, run.requestedBy)} · {formatWhen(run.createdAt, now)} · {runDuration(run, now)}
      </SkText>
      {live ? <ProgressBar done={run.shardsDone} total={run.shardsTotal} /> : null}
      {live && run.waitingFor.length > 0 ? (
        <SkText variant="caption" testID={`run-${run.id}-waiting`}>
          {waitingForWorkerWords(run.waitingFor)}
        </SkText>
      ) : null}
      <OutcomeCounts counts={run.counts} byClass={run.byClass} compact />
      {run.regressions ? (
        <SkText variant="smallLabel" tone="danger">
          {describeRegressions(run).text}
        </SkText>
      ) : null}
    </LinkCard>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: theme.space(2) },
  plan: { flex: 1 },
});
