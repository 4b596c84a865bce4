import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { refusalMessage } from '../../client/refusal-message';
import { useDeleteSchedule } from '../../client/use-delete-schedule';
import { useToggleSchedule } from '../../client/use-toggle-schedule';
import { theme } from '../../constants/theme';
import type { ScheduleView } from '../../shared/schedule-view';
import { ActionButton } from '../ui/action-button';
import { ConfirmAction } from '../ui/confirm-action';
import { SkText } from '../ui/sk-text';
import { NextRuns } from './next-runs';
import { OnOffSwitch } from '../ui/on-off-switch';
import { ScheduleEditor } from './schedule-editor';

/** One schedule of a plan: its expression and zone, the next times, and (for editors) on/off, edit, delete. */
export function ScheduleCard({ schedule, canEdit }: { schedule: ScheduleView; canEdit: boolean }) {
  const [editing, setEditing] = useState(false);
  const toggle = useToggleSchedule();
  const remove = useDeleteSchedule();
  const failure = [toggle.error, remove.error]
    .map((e) => refusalMessage(e, 'The server could not be reached.'))
    .find(Boolean);

  if (editing) return <ScheduleEditor planId={schedule.planId} schedule={schedule} onDone={() => setEditing(false)} />;
  return (
    <View style={styles.card} testID={`schedule-${schedule.id}`}>
      <View style={styles.top}>
        <View style={styles.what}>
          <Text style={styles.cron} accessibilityLabel={`Cron expression ${schedule.cron}`}>
            {schedule.cron}
          </Text>
          <SkText variant="caption">{schedule.timeZone}</SkText>
        </View>
        {canEdit ? (
          <OnOffSwitch
            value={schedule.enabled}
            onChange={(enabled) => toggle.mutate({ id: schedule.id, enabled })}
            accessibilityLabel={`Schedule ${schedule.cron} runs`}
            onWord="Runs"
            offWord="Paused"
          />
        ) : (
          <SkText variant="smallLabel" style={schedule.enabled && styles.stateOn}>
            {schedule.enabled ? '✓ Runs' : '− Paused'}
          </SkText>
        )}
      </View>
      {schedule.enabled ? (
        <NextRuns nextRuns={schedule.nextRuns} timeZone={schedule.timeZone} />
      ) : (
        <SkText variant="caption">Paused: this schedule starts no runs until it is turned on again.</SkText>
      )}
      {failure ? (
        <SkText variant="caption" tone="danger" accessibilityRole="alert">
          ❌ {failure}
        </SkText>
      ) : null}
      {canEdit ? (
        <View style={styles.buttons}>
          <ActionButton
            label="Edit"
            accessibilityLabel={`Edit schedule ${schedule.cron}`}
            tone="quiet"
            onPress={() => setEditing(true)}
          />
          <ConfirmAction
            label="Delete"
            accessibilityLabel={`Delete schedule ${schedule.cron}`}
            question={`Delete the schedule “${schedule.cron}”? The plan stays; it just stops running at these times.`}
            confirmLabel="Yes, delete"
            busy={remove.isPending}
            onConfirm={() => remove.mutate(schedule.id)}
          />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { gap: theme.space(3), paddingVertical: theme.space(3), borderTopWidth: 1, borderTopColor: theme.color.rule },
  top: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: theme.space(3),
    flexWrap: 'wrap',
  },
  what: { gap: 2, flexShrink: 1 },
  cron: { fontFamily: theme.font.mono, fontSize: theme.size.large, color: theme.color.ink },
  stateOn: { color: theme.color.accent },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2), alignItems: 'flex-start' },
});
