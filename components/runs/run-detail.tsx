import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { canEditPlans } from '../../client/can-edit-plans';
import { isLiveRun } from '../../client/is-live-run';
import { useMe } from '../../client/use-me';
import { useRun } from '../../client/use-run';
import { useRunMatrix } from '../../client/use-run-matrix';
import { useRunProperties } from '../../client/use-run-properties';
import { theme } from '../../constants/theme';
import type { CheckedScope } from '../../shared/run-result';
import { SkText } from '../ui/sk-text';
import { CheckedScopeNote } from './checked-scope-note';
import { PropertyChecks } from './property-checks';
import { QueryState } from '../ui/query-state';
import { LiveWorkersNote } from './live-workers-note';
import { RunHeader } from './run-header';
import { RunMatrix } from './run-matrix';
import { ScreenBody } from '../ui/screen-body';
import { shortRunId } from '../../shared/short-run-id';
import { describeMatrixCell } from './describe-matrix-cell';
import { judgedPoints } from '../../shared/judged-points';
import { tallyCells } from './tally-cells';

/** One run: its header and progress, what it checked, its matrix (each suite against each library version) and its property checks; live while it runs. */
export function RunDetail({ id, openedExisting = false }: { id: string; openedExisting?: boolean }) {
  const run = useRun(id);
  const { data: me } = useMe();
  const live = run.data ? isLiveRun(run.data) : undefined;
  const matrix = useRunMatrix(id, live);
  const properties = useRunProperties(id, live);

  if (run.isPending) {
    return (
      <ScreenBody title="Run" pageTitle={`Run ${shortRunId(id)}`}>
        <QueryState state="loading" />
      </ScreenBody>
    );
  }
  if (run.isError) {
    const missing = run.error instanceof ApiRequestError && (run.error.status === 404 || run.error.status === 400);
    return (
      <ScreenBody title="Run" pageTitle={`Run ${shortRunId(id)}`}>
        <BackLink />
        <QueryState
          state="error"
          message={missing ? 'There is no run at this address.' : run.error.message}
          onRetry={missing ? undefined : () => void run.refetch()}
        />
      </ScreenBody>
    );
  }

  // Cells waiting or running under a finished run are from a poll before its end, and the final
  // fetch (use-run.ts) is on its way: say so rather than show them under "completed".
  const finishing =
    live === false &&
    matrix.isFetching &&
    (matrix.data ?? []).some((c) => c.status === 'queued' || c.status === 'running');
  const cells = finishing ? [] : (matrix.data ?? []);
  const checks = matrix.data && !finishing ? tallyCells(cells.map((c) => describeMatrixCell(c, id))) : undefined;
  const scopes = cells
    .filter((c) => judgedPoints(c) > 0)
    .map((c) => c.checked)
    .filter((s): s is CheckedScope => s !== null && s.points > 0);
  const notChecked = cells.length - scopes.length;
  const outcomes = properties.data?.map((p) => p.outcome.kind) ?? [];
  const propertySummary = properties.data
    ? {
        held: outcomes.filter((k) => k === 'held').length,
        failed: outcomes.filter((k) => k === 'failed').length,
        notChecked: outcomes.filter((k) => k === 'not-checked').length,
      }
    : undefined;

  return (
    <ScreenBody
      title={run.data.planName}
      pageTitle={`Run ${shortRunId(id)} of ${run.data.planName}`}
      // The run's short id, which the failure table's Run filter takes; its checks are counted in the
      // header and under the matrix's heading, which says what a check is.
      lead={`Run ${shortRunId(id)} of this plan.`}
    >
      <BackLink />
      {openedExisting ? (
        <SkText variant="body" accessibilityRole="alert" testID="opened-existing-run">
          This plan already had a run in progress, so Run now opened it instead of starting a second one.
        </SkText>
      ) : null}
      <RunHeader run={run.data} canCancel={me ? canEditPlans(me.role) : false} checks={checks} />
      {live ? <LiveWorkersNote /> : null}
      {matrix.data && !finishing ? (
        <CheckedScopeNote scopes={scopes} checksNotChecked={notChecked} properties={propertySummary} subject="matrix" />
      ) : null}

      <SkText variant="heading" accessibilityRole="header" style={styles.section}>
        Each suite against each library version
      </SkText>
      {matrix.isPending ? (
        <QueryState state="loading" />
      ) : finishing ? (
        <SkText variant="body" tone="inkSoft" accessibilityLiveRegion="polite" testID="matrix-finishing">
          Fetching this run&apos;s final results…
        </SkText>
      ) : matrix.isError ? (
        <QueryState state="error" message={matrix.error.message} onRetry={() => void matrix.refetch()} />
      ) : cells.length === 0 ? (
        <QueryState state="empty" message="This run has no checks." />
      ) : (
        <RunMatrix runId={id} cells={cells} />
      )}

      <SkText variant="heading" accessibilityRole="header" style={styles.section}>
        Property checks
      </SkText>
      {properties.isPending ? (
        <QueryState state="loading" />
      ) : properties.isError ? (
        <QueryState state="error" message={properties.error.message} onRetry={() => void properties.refetch()} />
      ) : properties.data.length === 0 ? (
        <QueryState
          state="empty"
          message={
            live
              ? 'No property check has finished yet.'
              : 'No property checks in this run: its suites list none, or no check got that far.'
          }
        />
      ) : (
        <PropertyChecks rows={properties.data} />
      )}
    </ScreenBody>
  );
}

function BackLink() {
  return (
    <Link href="/runs" asChild>
      <Pressable accessibilityRole="link" accessibilityLabel="All runs" style={StyleSheet.flatten(styles.back)}>
        <SkText variant="label" tone="accent">
          ← All runs
        </SkText>
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  back: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
  section: { marginTop: theme.space(2) },
});
