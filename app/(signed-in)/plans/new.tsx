import { useRouter } from 'expo-router';
import { canEditPlans } from '../../../client/can-edit-plans';
import { useMe } from '../../../client/use-me';
import { PlanForm } from '../../../components/plans/plan-form';
import { QueryState } from '../../../components/ui/query-state';
import { ScreenBody } from '../../../components/ui/screen-body';

export default function NewPlanScreen() {
  const { data: me } = useMe();
  const router = useRouter();
  if (!me) return null;
  return (
    <ScreenBody title="New plan" lead="Choose approved suites and installed targets; every suite runs on every target.">
      {canEditPlans(me.role) ? (
        <PlanForm onSaved={(plan) => router.replace(`/plans/${plan.id}`)} onCancel={() => router.replace('/plans')} />
      ) : (
        <QueryState state="error" message="Only maintainers and admins can make plans." />
      )}
    </ScreenBody>
  );
}
