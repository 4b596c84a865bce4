import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { formatTimeInZone } from '../../client/format-time-in-zone';
import { usePlans } from '../../client/use-plans';
import { useSchedules } from '../../client/use-schedules';
import { theme } from '../../constants/theme';
import type { ScheduleView } from '../../shared/schedule-view';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

/** Every plan as a card (a grid on a wide screen): what it checks, who hears, and when it runs next. */
export function PlanList() {
  const plans = usePlans();
  const schedules = useSchedules();
  const { width } = useWindowDimensions();
  const columns = width >= 1400 ? 3 : width >= theme.wide ? 2 : 1;

  if (plans.isPending) return <QueryState state="loading" />;
  if (plans.isError)
    return <QueryState state="error" message={plans.error.message} onRetry={() => void plans.refetch()} />;
  if (plans.data.length === 0)
    return (
      <QueryState
        state="empty"
        message="No plans yet. A plan pairs approved suites with targets and says who hears about regressions."
      />
    );

  const byPlan = new Map<string, ScheduleView[]>();
  for (const s of schedules.data ?? []) byPlan.set(s.planId, [...(byPlan.get(s.planId) ?? []), s]);

  return (
    <View style={styles.grid} testID="plan-list">
      {plans.data.map((plan) => {
        const own = byPlan.get(plan.id) ?? [];
        const next = own
          .filter((s) => s.enabled && s.nextRuns[0])
          .map((s) => ({ at: s.nextRuns[0]!, zone: s.timeZone }))
          .sort((a, b) => a.at.localeCompare(b.at))[0];
        const when = next ? formatTimeInZone(next.at, next.zone) : null;
        const size = `${plan.suites.length} ${plan.suites.length === 1 ? 'suite' : 'suites'} × ${plan.targets.length} ${plan.targets.length === 1 ? 'target' : 'targets'}`;
        const targets = plan.targets.map((t) => (t.installed ? t.name : `${t.name} (not installed)`)).join(' · ');
        const schedule = schedules.isPending
          ? 'Schedules loading…'
          : when
            ? `next ${when.when} ${next!.zone} (${when.distance})`
            : own.length > 0
              ? '− every schedule paused'
              : '− no schedule';
        const recipients = `${plan.recipients.length} ${plan.recipients.length === 1 ? 'recipient' : 'recipients'}`;
        return (
          <Link key={plan.id} href={`/plans/${plan.id}`} asChild>
            <Pressable
              accessibilityRole="link"
              // Named by the words the card shows (WCAG 2.5.3): a label of its own never matched
              // them as axe-core reads them, block by block.
              style={StyleSheet.flatten([styles.card, { width: columns === 1 ? '100%' : `${100 / columns - 2}%` }])}
            >
              <SkText variant="heading">{plan.name}</SkText>
              {plan.description ? (
                <SkText variant="caption" style={styles.description} numberOfLines={3}>
                  {plan.description}
                </SkText>
              ) : null}
              <SkText variant="label" tone="accent">
                {size}
              </SkText>
              <Text style={styles.targets} numberOfLines={2}>
                {targets}
              </Text>
              <View style={styles.foot}>
                <SkText variant="caption" tone="ink">
                  {schedule}
                </SkText>
                <SkText variant="caption" tone="inkFaint">
                  {recipients}
                </SkText>
              </View>
            </Pressable>
          </Link>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(2),
    minHeight: 44,
  },
  description: { lineHeight: 20 },
  targets: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  foot: { marginTop: 'auto', paddingTop: theme.space(2), borderTopWidth: 1, borderTopColor: theme.color.rule, gap: 2 },
});
