import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { isLiveRun } from '../../client/is-live-run';
import { theme } from '../../constants/theme';
import type { RunView } from '../../shared/run-view';
import { SkText } from '../ui/sk-text';
import { CancelRunButton } from './cancel-run-button';
import { describeRegressions } from './describe-regressions';
import { formatWhen } from './format-when';
import { OutcomeCounts } from './outcome-counts';
import { ProgressBar } from './progress-bar';
import { regressionsHref } from './regressions-href';
import { runDuration } from './run-duration';
import { RunStatusBadge } from './run-status-badge';
import type { CellTally } from './tally-cells';
import { tallyWords } from './tally-words';
import { triggerWords } from './trigger-words';
import { waitingForWorkerWords } from './waiting-for-worker-words';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

/**
 * The top of a run: its verdict (from the run view alone, as every list shows it), who started it
 * and when, how long, its checks (suite × library version) by outcome once its matrix is known,
 * its point counts, and progress and cancel while it is live. The checks are counted by the
 * matrix's own rule (tally-cells.ts), the rule the run's stored `checksStopped` is counted by, so
 * the tally's stopped checks and the verdict's agree.
 */
export function RunHeader({ run, canCancel, checks }: { run: RunView; canCancel: boolean; checks?: CellTally }) {
  const live = isLiveRun(run);
  const regressions = describeRegressions(run);
  const facts: [string, string][] = [
    ['Started', `${triggerWords(run.trigger, run.requestedBy)}, ${formatWhen(run.createdAt)}`],
    ['Duration', runDuration(run)],
    ['Checks', `${run.shardsDone} of ${run.shardsTotal} done`],
    ['Regressions', regressions.text],
  ];
  return (
    <View style={styles.card} testID="run-header">
      <RunStatusBadge run={run} />
      <View style={styles.facts}>
        {facts.map(([label, value]) => (
          <View key={label} style={styles.fact}>
            <SkText variant="smallLabel" tone="inkFaint" style={styles.label}>
              {label}
            </SkText>
            {label === 'Regressions' && regressions.count > 0 ? (
              <Link href={regressionsHref(run.id)} asChild>
                <Pressable
                  accessibilityRole="link"
                  accessibilityLabel={`${value}: open them in the failure table`}
                  style={StyleSheet.flatten(styles.link)}
                >
                  <SkText variant="body" style={styles.danger}>
                    {value} →
                  </SkText>
                </Pressable>
              </Link>
            ) : (
              <SkText variant="body">{value}</SkText>
            )}
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
      {checks ? (
        <View style={styles.counted}>
          <SkText variant="smallLabel" tone="inkFaint" style={styles.label}>
            Check outcomes
          </SkText>
          <SkText variant="body" testID="run-check-tally">
            {tallyWords(checks)}
          </SkText>
        </View>
      ) : null}
      <View style={styles.counted}>
        <SkText variant="smallLabel" tone="inkFaint" style={styles.label}>
          Points
        </SkText>
        <OutcomeCounts counts={run.counts} byClass={run.byClass} all />
      </View>
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
  counted: { gap: 2 },
  label: { textTransform: 'uppercase', letterSpacing: 0.8 },
  danger: { color: theme.color.danger, fontFamily: theme.font.medium },
  link: { minHeight: 44, justifyContent: 'center' },
  waiting: { fontFamily: theme.font.medium },
});
