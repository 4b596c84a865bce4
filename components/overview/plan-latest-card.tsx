import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { OverviewView } from '../../shared/overview-view';
import type { OutcomeCounts as Counts } from '../../shared/run-result';
import { formatWhen } from '../runs/format-when';
import { OutcomeCounts } from '../runs/outcome-counts';
import { runDuration } from '../runs/run-duration';
import { RunStatusBadge } from '../runs/run-status-badge';

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
      <Text style={styles.plan}>{plan.planName}</Text>
      {run ? (
        <>
          <RunStatusBadge run={run} />
          <Text style={styles.meta}>
            Finished {formatWhen(run.finishedAt ?? run.createdAt, now)} · took {runDuration(run, now)}
          </Text>
          <OutcomeCounts counts={run.counts} compact />
          <Text style={[styles.regressions, run.regressions ? styles.danger : null]}>
            {run.regressions === null
              ? 'Regressions not compared (the run did not complete).'
              : run.regressions === 0
                ? plan.previous
                  ? '✓ No regressions since the previous completed run.'
                  : 'No earlier completed run to compare with.'
                : `❌ ${run.regressions} regression${run.regressions === 1 ? '' : 's'}: passed in the previous completed run, fail now.`}
          </Text>
          {plan.previous ? <Text style={styles.meta}>{change(run.counts, plan.previous.counts)}</Text> : null}
          <View style={styles.links}>
            <Link href={`/runs/${run.id}`} asChild>
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`Open the latest run of ${plan.planName}`}
                style={StyleSheet.flatten(styles.link)}
              >
                <Text style={styles.linkText}>Open run →</Text>
              </Pressable>
            </Link>
            <Link href={`/runs?plan=${plan.planId}`} asChild>
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`Every run of ${plan.planName}`}
                style={StyleSheet.flatten(styles.link)}
              >
                <Text style={styles.linkText}>All runs of this plan</Text>
              </Pressable>
            </Link>
          </View>
        </>
      ) : (
        <Text style={styles.meta}>− Not run yet: nothing checked for this plan.</Text>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  card: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    padding: theme.space(4),
    gap: theme.space(2),
  },
  // Only beside other cards: in a column a basis would set the height.
  inRow: { flexGrow: 1, flexBasis: 320 },
  plan: { fontFamily: theme.font.bold, fontSize: theme.size.body, color: theme.color.ink },
  meta: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
  regressions: {
    fontFamily: theme.font.medium,
    fontSize: theme.size.small,
    color: theme.color.inkSoft,
    lineHeight: 20,
  },
  danger: { color: theme.color.danger },
  links: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(5) },
  link: { minHeight: 44, justifyContent: 'center' },
  linkText: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.accent },
});
