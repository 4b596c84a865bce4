import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { usePlanNames } from '../../client/use-plan-names';
import { useRuns, type RunFilters as Filters } from '../../client/use-runs';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { RunCard } from './run-card';
import { RunFilters } from './run-filters';
import { RunsTable } from './runs-table';

/** The Runs list: filters, then runs as cards on a phone and a table on a wide screen, older pages on demand. */
export function RunsList({ filters, onFiltersChange }: { filters: Filters; onFiltersChange: (next: Filters) => void }) {
  const runs = useRuns(filters);
  const plans = usePlanNames();
  const wide = useWindowDimensions().width >= theme.wide;
  const filtered = Boolean(filters.plan || filters.status || filters.trigger);
  const all = runs.data?.pages.flatMap((page) => page.runs) ?? [];

  let body;
  if (runs.isPending) body = <QueryState state="loading" />;
  else if (runs.isError)
    body = <QueryState state="error" message={runs.error.message} onRetry={() => void runs.refetch()} />;
  else if (all.length === 0)
    body = (
      <QueryState
        state="empty"
        message={
          filtered
            ? 'No run matches these filters.'
            : 'No runs yet. A plan runs on its schedule, or a maintainer starts it from Plans.'
        }
      />
    );
  else
    body = (
      <View style={styles.list}>
        <SkText variant="caption" accessibilityLiveRegion="polite">
          {all.length} run{all.length === 1 ? '' : 's'} shown{runs.hasNextPage ? ', more below' : ''}
        </SkText>
        {wide ? <RunsTable runs={all} /> : all.map((run) => <RunCard key={run.id} run={run} />)}
        {runs.hasNextPage ? (
          <ActionButton
            label="Show older runs"
            tone="quiet"
            busy={runs.isFetchingNextPage}
            onPress={() => void runs.fetchNextPage()}
          />
        ) : null}
      </View>
    );

  return (
    <View style={styles.box}>
      {plans.isError ? (
        <SkText variant="caption" tone="danger">
          × Plans could not be loaded, so the plan filter is missing: {plans.error.message}
        </SkText>
      ) : null}
      <RunFilters value={filters} plans={plans.data ?? []} onChange={onFiltersChange} />
      {body}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(4) },
  list: { gap: theme.space(3) },
});
