import { Link } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { OverviewView } from '../../shared/overview-view';
import type { OutcomeCounts as Counts } from '../../shared/run-result';
import { formatWhen } from '../runs/format-when';
import { OutcomeCounts } from '../runs/outcome-counts';
import { runDuration } from '../runs/run-duration';
import { RunStatusBadge } from '../runs/run-status-badge';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

/** How failures and errors moved since the previous completed run, in words with arrows. */
function change(latest: Counts, previous: Counts): string {
  const parts: string[] = [];
  for (const [key, word] of [
    ['fail', 'failed'],
    ['error', 'in error'],
  ] as const) {
    const d = latest[key] - previous[key];
    if (d > 0) parts.push(`↑ ${d} more ${word}`);
    if (d < 0) parts.push(`↓ ${-d} fewer ${word}`);
  }
  return parts.length
    ? `Since the previous completed run: ${parts.join(', ')}.`
    : 'Since the previous completed run: no change in failures or errors.';
}

/** A plan on the Overview: its latest finished run (status, counts, regressions, change since the run before), or that it never ran. */
export function PlanLatestCard({
  plan,
  now,
  inRow = false,
}: {
  plan: OverviewView['plans'][number];
  now?: number;
  inRow?: boolean;
}) {
  const run = plan.latest;
  return (
    <View style={[styles.card, inRow && styles.inRow]} testID={`plan-${plan.planName}`}>
      <SkText variant="strong">{plan.planName}</SkText>
      {run ? (
        <>
          <RunStatusBadge run={run} />
          <SkText variant="caption" style={styles.meta}>
            Finished {formatWhen(run.finishedAt ?? run.createdAt, now)} · took {runDuration(run, now)}
          </SkText>
          <OutcomeCounts counts={run.counts} byClass={run.byClass} compact />
          <SkText variant="smallLabel" style={[styles.regressions, run.regressions ? styles.danger : null]}>
            {run.regressions === null
              ? 'Regressions not compared (the run did not complete).'
              : run.regressions === 0
                ? plan.previous
                  ? '✓ No regressions since the previous completed run.'
                  : 'No earlier completed run to compare with.'
                : `❌ ${run.regressions} regression${run.regressions === 1 ? '' : 's'}: passed in the previous completed run, fail now.`}
          </SkText>
          {plan.previous ? (
            <SkText variant="caption" style={styles.meta}>
              {change(run.counts, plan.previous.counts)}
            </SkText>
          ) : null}
          <View style={styles.links}>
            <Link href={`/runs/${run.id}`} asChild>
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`Open the latest run of ${plan.planName}`}
                style={StyleSheet.flatten(styles.link)}
              >
                <SkText variant="label" tone="accent">
                  Open run →
                </SkText>
              </Pressable>
            </Link>
            <Link href={`/runs?plan=${plan.planId}`} asChild>
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`Every run of ${plan.planName}`}
                style={StyleSheet.flatten(styles.link)}
              >
                <SkText variant="label" tone="accent">
                  All runs of this plan
                </SkText>
              </Pressable>
            </Link>
          </View>
        </>
      ) : (
        <SkText variant="caption" style={styles.meta}>
          − Not run yet: nothing checked for this plan.
        </SkText>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(2),
  },
  // Only beside other cards: in a column a basis would set the height.
  inRow: { flexGrow: 1, flexBasis: 320 },
  meta: { lineHeight: 20 },
  regressions: { lineHeight: 20 },
  danger: { color: theme.color.danger },
  links: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(5) },
  link: { minHeight: 44, justifyContent: 'center' },
});
