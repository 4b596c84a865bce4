import { Link } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { canEditPlans } from '../../../client/can-edit-plans';
import { useMe } from '../../../client/use-me';
import { PlanList } from '../../../components/plans/plan-list';
import { ScreenBody } from '../../../components/ui/screen-body';
import { SkText } from '../../../components/ui/sk-text';
import { theme } from '../../../constants/theme';

export default function PlansScreen() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <ScreenBody
      title="Plans"
      lead="Which suites run against which library versions, when, and who hears about regressions."
    >
      {canEditPlans(me.role) ? (
        <Link href={'/plans/new'} asChild>
          <Pressable accessibilityRole="link" accessibilityLabel="New plan" style={StyleSheet.flatten(styles.newPlan)}>
            <SkText variant="label" tone="accentInk">
              + New plan
            </SkText>
          </Pressable>
        </Link>
      ) : null}
      <PlanList />
    </ScreenBody>
  );
}

const styles = StyleSheet.create({
  newPlan: {
    alignSelf: 'flex-start',
    minHeight: theme.touch,
    justifyContent: 'center',
    paddingHorizontal: theme.space(5),
    borderRadius: theme.radius,
    backgroundColor: theme.color.accent,
  },
});
