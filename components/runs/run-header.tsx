import { StyleSheet, View } from 'react-native';
import { isLiveRun } from '../../client/is-live-run';
import { theme } from '../../constants/theme';
import type { RunView } from '../../shared/run-view';
import { SkText } from '../ui/sk-text';
import { CancelRunButton } from './cancel-run-button';
import { formatWhen } from './format-when';
import { OutcomeCounts } from './outcome-counts';
import { ProgressBar } from './progress-bar';
import { runDuration } from './run-duration';
import { RunStatusBadge } from './run-status-badge';
import { triggerWords } from './trigger-words';
import { waitingForWorkerWords } from './waiting-for-worker-words';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

/** The top of a run: its status, who started it and when, how long, its point counts, and progress and cancel while it is live. */
export function RunHeader({ run, canCancel }: { run: RunView; canCancel: boolean }) {
  const live = isLiveRun(run);
  const facts: [string, string][] = [
    ['Started', `${triggerWords(run.trigger, run.requestedBy)}, ${formatWhen(run.createdAt)}`],
    ['Duration', runDuration(run)],
    ['Shards', `${run.shardsDone} of ${run.shardsTotal} done`],
    [
      'Regressions',
      run.regressions === null
        ? live
          ? 'counted when the run completes'
          : 'not compared'
        : `${run.regressions} since the previous completed run`,
    ],
  ];
  return (
    <View style={styles.card}>
      <RunStatusBadge run={run} />
      <View style={styles.facts}>
        {facts.map(([label, value]) => (
          <View key={label} style={styles.fact}>
            <SkText variant="smallLabel" tone="inkFaint" style={styles.label}>
              {label}
            </SkText>
            <SkText variant="body" style={label === 'Regressions' && run.regressions ? styles.danger : null}>
              {value}
            </SkText>
          </View>
        ))}
      </View>
      {live ? (
        <View accessibilityLiveRegion="polite">
          <ProgressBar done={run.shardsDone} total={run.shardsTotal} />
        </View>
      ) : null}
      {live && run.waitingFor.length > 0 ? (
        <SkText variant="body" style={styles.waiting} accessibilityRole="alert" testID="run-waiting-for-worker">
          {waitingForWorkerWords(run.waitingFor)}
        </SkText>
      ) : null}
      <OutcomeCounts counts={run.counts} byClass={run.byClass} all />
      {live && canCancel ? <CancelRunButton runId={run.id} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(3),
  },
  facts: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(4) },
  fact: { flexBasis: 150, flexGrow: 1, gap: 2 },
  label: { textTransform: 'uppercase', letterSpacing: 0.8 },
  danger: { color: theme.color.danger, fontFamily: theme.font.medium },
  waiting: { fontFamily: theme.font.medium },
});
