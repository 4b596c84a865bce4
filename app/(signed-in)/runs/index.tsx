import { useLocalSearchParams, useRouter } from 'expo-router';
import { runFiltersFromParams } from '../../../client/run-filters-from-params';
import { RunsList } from '../../../components/runs/runs-list';
import { ScreenBody } from '../../../components/ui/screen-body';

/** Every run, newest first; the filters live in the address so a filtered list can be shared. */
export default function RunsScreen() {
  const params = useLocalSearchParams<{ plan?: string; status?: string; trigger?: string }>();
  const router = useRouter();
  const filters = runFiltersFromParams(params);
  return (
    <ScreenBody
      title="Runs"
      lead="Each run executes a plan: every approved suite against every installed target of the plan, each pair one check."
    >
      <RunsList
        filters={filters}
        onFiltersChange={(next) => router.setParams({ plan: next.plan, status: next.status, trigger: next.trigger })}
      />
    </ScreenBody>
  );
}
