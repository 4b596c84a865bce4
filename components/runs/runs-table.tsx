import { Link } from 'expo-router';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import { Pressable, StyleSheet, View } from 'react-native';
import { isLiveRun } from '../../client/is-live-run';
import { theme } from '../../constants/theme';
import type { RunView } from '../../shared/run-view';
import { ColumnHead } from '../ui/column-head';
import { SkText } from '../ui/sk-text';
import { formatWhen } from './format-when';
import { OutcomeCounts } from './outcome-counts';
import { ProgressBar } from './progress-bar';
import { runDuration } from './run-duration';
import { RunStatusBadge } from './run-status-badge';
import { runVerdict } from './run-verdict';
import { triggerWords } from './trigger-words';
import { TABLE_BOX_STYLE } from '../ui/table-box-style';

/** Runs as table rows on a wide screen; each row opens its run. */
export function RunsTable({ runs, now }: { runs: RunView[]; now?: number }) {
  return (
    <View style={styles.table} role="table" aria-label="Runs">
      <View style={[styles.row, styles.headRow]} role="row">
        <ColumnHead role="columnheader" style={styles.status}>
          Status
        </ColumnHead>
        <ColumnHead role="columnheader" style={styles.plan}>
          Plan
        </ColumnHead>
        <ColumnHead role="columnheader" style={styles.who}>
          Started
        </ColumnHead>
        <ColumnHead role="columnheader" style={styles.duration}>
          Duration
        </ColumnHead>
        <ColumnHead role="columnheader" style={styles.counts}>
          Points
        </ColumnHead>
      </View>
      {runs.map((run) => (
        <Link key={run.id} href={`/runs/${run.id}`} asChild>
          <Pressable
            role="row"
            accessibilityRole="link"
            accessibilityLabel={`Run of ${run.planName}, ${runVerdict(run).said}, ${formatWhen(run.createdAt, now)}`}
            testID={`run-${run.id}`}
            // Link's asChild merges styles as objects: a flat one (an array breaks on web).
            style={StyleSheet.flatten([styles.row, styles.bodyRow])}
          >
            <View role="cell" style={styles.status}>
              <RunStatusBadge run={run} />
            </View>
            <View role="cell" style={styles.plan}>
              <SkText variant="label" numberOfLines={2}>
                {run.planName}
              </SkText>
              {run.regressions ? (
                <SkText variant="smallLabel" tone="danger">
                  {COMPARISON_WORDS.regressions(run.regressions)}
                </SkText>
              ) : null}
            </View>
            <View role="cell" style={styles.who}>
              <SkText variant="caption" tone="ink">
                {formatWhen(run.createdAt, now)}
              </SkText>
              <SkText variant="caption">{triggerWords(run.trigger, run.requestedBy)}</SkText>
            </View>
            <View role="cell" style={styles.duration}>
              <SkText variant="caption" tone="ink">
                {runDuration(run, now)}
              </SkText>
            </View>
            <View role="cell" style={[styles.counts, styles.countsCell]}>
              {isLiveRun(run) ? <ProgressBar done={run.shardsDone} total={run.shardsTotal} /> : null}
              <OutcomeCounts counts={run.counts} byClass={run.byClass} compact />
            </View>
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: TABLE_BOX_STYLE,
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingHorizontal: theme.space(4),
    paddingVertical: theme.space(3),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  headRow: { backgroundColor: theme.color.paper, paddingVertical: theme.space(2) },
  bodyRow: { minHeight: 64 },
  status: { width: 220 },
  plan: { flex: 2, gap: 2 },
  who: { flex: 2, gap: 2 },
  duration: { width: 110 },
  counts: { flex: 3 },
  countsCell: { gap: theme.space(1) },
});
