import { Link, useLocalSearchParams } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { canEditPlans } from '../../../client/can-edit-plans';
import { useMe } from '../../../client/use-me';
import { usePlan } from '../../../client/use-plan';
import { PlanDetail } from '../../../components/plans/plan-detail';
import { QueryState } from '../../../components/ui/query-state';
import { ScreenBody } from '../../../components/ui/screen-body';
import { SkText } from '../../../components/ui/sk-text';

export default function PlanScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const { data: me } = useMe();
  const plan = usePlan(String(id));
  if (!me) return null;
  return (
    <ScreenBody pageTitle={plan.data ? `Plan ${plan.data.name}` : 'Plan'} title={plan.data?.name ?? 'Plan'}>
      <Link href={'/plans'} asChild>
        <Pressable accessibilityRole="link" accessibilityLabel="All plans" style={StyleSheet.flatten(styles.back)}>
          <SkText variant="label" tone="accent">
            ← All plans
          </SkText>
        </Pressable>
      </Link>
      {plan.isPending ? <QueryState state="loading" /> : null}
      {plan.isError ? (
        <QueryState state="error" message={plan.error.message} onRetry={() => void plan.refetch()} />
      ) : null}
      {plan.data ? <PlanDetail plan={plan.data} canEdit={canEditPlans(me.role)} /> : null}
    </ScreenBody>
  );
}

const styles = StyleSheet.create({
  back: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
});
