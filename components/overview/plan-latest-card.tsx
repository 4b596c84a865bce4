import { Link, type Href } from 'expo-router';
import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { OverviewView } from '../../shared/overview-view';
import type { RunView } from '../../shared/run-view';
import { describeComparison } from '../runs/describe-comparison';
import { describeRegressions } from '../runs/describe-regressions';
import { formatWhen } from '../runs/format-when';
import { OutcomeCounts } from '../runs/outcome-counts';
import { regressionsHref } from '../runs/regressions-href';
import { runDuration } from '../runs/run-duration';
import { RunStatusBadge } from '../runs/run-status-badge';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

function CardLink({ href, label, text }: { href: Href; label: string; text: string }) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" accessibilityLabel={label} style={StyleSheet.flatten(styles.link)}>
        <SkText variant="label" tone="accent">
          {text}
        </SkText>
      </Pressable>
    </Link>
  );
}

/** What a run newer than the completed one is, plainly: why its counts are not the ones to read. */
function newerWords(run: RunView, now?: number): string {
  const done = `${run.shardsDone} of ${run.shardsTotal} suite × target pairs done`;
  switch (run.status) {
    case 'queued':
      return `A newer run is queued (started ${formatWhen(run.createdAt, now)}): its regressions are counted when it completes.`;
    case 'running':
      return `A newer run is running (${done}): its regressions are counted when it completes.`;
    case 'cancelled':
      return `A newer run was cancelled ${formatWhen(run.finishedAt ?? run.createdAt, now)} with ${done}: a cancelled run is not compared with anything, so its counts are partial and say nothing about regressions.`;
    case 'failed':
      return `A newer run failed ${formatWhen(run.finishedAt ?? run.createdAt, now)} with ${done}: a failed run is not compared with anything.`;
    case 'completed':
      return '';
  }
}

/**
 * A plan on the Overview: its latest completed run (status, counts, regressions as a link to
 * them, and how it compares with the completed run before it), and any newer run that has not
 * completed, said plainly beside it: a cancelled or running run never hides the completed
 * one's regressions.
 */
export function PlanLatestCard({
  plan,
  now,
  inRow = false,
}: {
  plan: OverviewView['plans'][number];
  now?: number;
  inRow?: boolean;
}) {
  const run = plan.completed;
  const regressions = run ? describeRegressions(run) : null;
  return (
    <View style={[styles.card, inRow && styles.inRow]} testID={`plan-${plan.planName}`}>
      <SkText variant="strong">{plan.planName}</SkText>
      {run && regressions ? (
        <>
          <SkText variant="smallLabel" tone="inkSoft">
            Latest completed run
          </SkText>
          <RunStatusBadge run={run} />
          <SkText variant="caption" style={styles.meta}>
            Finished {formatWhen(run.finishedAt ?? run.createdAt, now)} · took {runDuration(run, now)}
          </SkText>
          <OutcomeCounts counts={run.counts} byClass={run.byClass} compact />
          {regressions.count > 0 ? (
            <Link href={regressionsHref(run.id)} asChild>
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`${regressions.text}: open them in the failure table`}
                style={StyleSheet.flatten(styles.link)}
                testID={`plan-${plan.planName}-regressions`}
              >
                <SkText variant="label" style={styles.danger}>
                  {regressions.text} →
                </SkText>
              </Pressable>
            </Link>
          ) : (
            <SkText variant="smallLabel" style={styles.meta}>
              {regressions.text[0]!.toUpperCase() + regressions.text.slice(1)}.
            </SkText>
          )}
          {plan.comparison
            ? describeComparison(plan.comparison).map((line) => (
                <SkText key={line} variant="caption" style={styles.meta}>
                  {line}
                </SkText>
              ))
            : null}
          <View style={styles.links}>
            <CardLink
              href={`/runs/${run.id}`}
              label={`Open run: the latest completed run of ${plan.planName}`}
              text="Open run →"
            />
            <CardLink
              href={`/runs?plan=${plan.planId}`}
              label={`All runs of this plan, ${plan.planName}`}
              text="All runs of this plan"
            />
          </View>
        </>
      ) : plan.newer ? (
        <SkText variant="caption" style={styles.meta}>
          No run of this plan has completed yet: nothing to compare with.
        </SkText>
      ) : (
        <SkText variant="caption" style={styles.meta}>
          − Not run yet: nothing checked for this plan.
        </SkText>
      )}
      {plan.newer ? (
        <View style={styles.newer} testID={`plan-${plan.planName}-newer`}>
          <RunStatusBadge run={plan.newer} />
          <SkText variant="caption" tone="ink" style={styles.meta}>
            {newerWords(plan.newer, now)}
          </SkText>
          <CardLink
            href={`/runs/${plan.newer.id}`}
            label={`Open the ${plan.newer.status} run: the newer run of ${plan.planName}`}
            text={`Open the ${plan.newer.status} run →`}
          />
        </View>
      ) : null}
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
  danger: { color: theme.color.danger },
  links: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(5) },
  link: { minHeight: 44, justifyContent: 'center' },
  newer: {
    gap: theme.space(1),
    marginTop: theme.space(1),
    paddingTop: theme.space(2),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
  },
});
