import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSchedules } from '../../client/use-schedules';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { ScheduleCard } from './schedule-card';
import { ScheduleEditor } from './schedule-editor';
import { TitledPanel } from '../ui/titled-panel';

/** The schedules of one plan, and (for editors) a way to add one. */
export function PlanSchedules({ planId, canEdit }: { planId: string; canEdit: boolean }) {
  const schedules = useSchedules();
  const [adding, setAdding] = useState(false);
  const mine = schedules.data?.filter((s) => s.planId === planId) ?? [];
  return (
    <TitledPanel
      title="Schedules"
      lead="When this plan runs by itself. Times are cron expressions read in the schedule's time zone."
      testID="plan-schedules"
    >
      {schedules.isPending ? <QueryState state="loading" /> : null}
      {schedules.isError ? (
        <QueryState state="error" message={schedules.error.message} onRetry={() => void schedules.refetch()} />
      ) : null}
      {schedules.isSuccess && mine.length === 0 && !adding ? (
        <SkText variant="body" tone="inkSoft">
          No schedule: this plan runs only when started by hand or through the API.
        </SkText>
      ) : null}
      {mine.map((s) => (
        <ScheduleCard key={s.id} schedule={s} canEdit={canEdit} />
      ))}
      {canEdit ? (
        adding ? (
          <View style={styles.adding}>
            <ScheduleEditor planId={planId} onDone={() => setAdding(false)} />
          </View>
        ) : (
          <ActionButton label="Add schedule" tone="quiet" onPress={() => setAdding(true)} />
        )
      ) : null}
    </TitledPanel>
  );
}

const styles = StyleSheet.create({
  adding: { paddingTop: theme.space(3), borderTopWidth: 1, borderTopColor: theme.color.rule },
});
