import { useLocalSearchParams } from 'expo-router';
import { OPENED_EXISTING_PARAM } from '../../../client/opened-existing-param';
import { useRun } from '../../../client/use-run';
import { RunDetail } from '../../../components/runs/run-detail';
import { PageTitle } from '../../../components/ui/page-title';

/** One run, by id: progress, matrix, property checks and what was checked. */
export default function RunScreen() {
  const params = useLocalSearchParams<{ id: string; [OPENED_EXISTING_PARAM]?: string }>();
  const id = String(params.id);
  const run = useRun(id);
  return (
    <>
      <PageTitle title={run.data ? `Run ${id.slice(0, 8)} of ${run.data.planName}` : `Run ${id.slice(0, 8)}`} />
      <RunDetail id={id} openedExisting={params[OPENED_EXISTING_PARAM] === '1'} />
    </>
  );
}
