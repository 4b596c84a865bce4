import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { useLatestRun } from '../../client/use-latest-run';
import { theme } from '../../constants/theme';
import { RunCard } from '../runs/run-card';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { TitledPanel } from '../ui/titled-panel';

/**
 * A plan's newest run as the runs list and the Overview show it (the same card, so the same
 * verdict: checks stopped by an error counted in words), and a link to all of its runs.
 */
export function PlanLatestRun({ planId, planName }: { planId: string; planName: string }) {
  const latest = useLatestRun(planId);
  return (
    <TitledPanel title="Latest run" testID="plan-latest-run">
      {latest.isPending ? <QueryState state="loading" /> : null}
      {latest.isError ? (
        <QueryState state="error" message={latest.error.message} onRetry={() => void latest.refetch()} />
      ) : null}
      {latest.data === null ? <SkText variant="caption">− Not run yet: nothing checked for this plan.</SkText> : null}
      {latest.data ? (
        <>
          <RunCard run={latest.data} />
          <Link href={`/runs?plan=${planId}`} asChild>
            <Pressable
              accessibilityRole="link"
              accessibilityLabel={`All runs of this plan, ${planName}`}
              style={StyleSheet.flatten(styles.link)}
            >
              <SkText variant="label" tone="accent">
                All runs of this plan
              </SkText>
            </Pressable>
          </Link>
        </>
      ) : null}
    </TitledPanel>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: 'flex-start', minHeight: theme.touch, justifyContent: 'center' },
});
