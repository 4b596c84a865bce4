import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { serverFieldErrors } from '../../client/server-field-errors';
import { useSaveSchedule } from '../../client/use-save-schedule';
import { useSchedulePreview } from '../../client/use-schedule-preview';
import { theme } from '../../constants/theme';
import { cronPreviewBody } from '../../shared/schemas/schedule-body';
import { MIN_SCHEDULE_INTERVAL_MINUTES } from '../../shared/min-schedule-interval-minutes';
import type { ScheduleView } from '../../shared/schedule-view';
import { FormActions } from '../ui/form-actions';
import { RadioMark } from '../ui/radio-mark';
import { SkText } from '../ui/sk-text';
import { NextRuns } from './next-runs';
import { TextField } from '../ui/text-field';
import { CHOICE_CHIP_STYLE } from '../ui/choice-chip-style';

/** Common shapes to start from; each is plain cron, so what is saved is what is shown. */
const STARTERS = [
  { label: 'Nightly 02:30', cron: '30 2 * * *' },
  { label: 'Weekdays 04:00', cron: '0 4 * * 1-5' },
  { label: 'Sundays 03:15', cron: '15 3 * * 0' },
];

const deviceZone = (() => {
  try {
    return Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';
  } catch {
    return 'UTC';
  }
})();

type Field = 'cron' | 'timeZone';

/**
 * Creates or changes a plan's schedule. The next three times are worked out by the server as the
 * expression is typed, and a rule it breaks shows beside the field before anything is saved.
 */
export function ScheduleEditor({
  planId,
  schedule,
  onDone,
}: {
  planId: string;
  schedule?: ScheduleView;
  onDone: () => void;
}) {
  const [cron, setCron] = useState(schedule?.cron ?? '30 2 * * *');
  const [timeZone, setTimeZone] = useState(schedule?.timeZone ?? deviceZone);
  const [submitErrors, setSubmitErrors] = useState<Partial<Record<Field, string>>>({});
  const preview = useSchedulePreview(cron, timeZone);
  const save = useSaveSchedule(planId, schedule?.id ?? null);
  const fromServer = serverFieldErrors(save.error);
  const errorOf = (field: Field) => preview.issues[field] ?? submitErrors[field] ?? fromServer[field];
  const other =
    save.error instanceof ApiRequestError && save.error.body.kind !== 'invalid-input'
      ? save.error.body.message
      : save.error && !(save.error instanceof ApiRequestError)
        ? 'The server could not be reached; nothing was saved.'
        : null;
  const zones = Array.from(new Set(['UTC', deviceZone, ...(schedule ? [schedule.timeZone] : [])]));

  const submit = () => {
    const checked = cronPreviewBody.safeParse({ cron, timeZone });
    if (!checked.success) {
      const errors: Partial<Record<Field, string>> = {};
      for (const issue of checked.error.issues) {
        const field = issue.path[0];
        if ((field === 'cron' || field === 'timeZone') && !errors[field]) errors[field] = issue.message;
      }
      setSubmitErrors(errors);
      return;
    }
    setSubmitErrors({});
    save.mutate(checked.data, { onSuccess: () => onDone() });
  };

  return (
    <View style={styles.editor} testID="schedule-editor">
      <TextField
        label="Cron expression"
        value={cron}
        onChangeText={(text) => {
          setCron(text);
          setSubmitErrors({});
        }}
        error={errorOf('cron')}
        autoCapitalize="none"
        mono
        testID="schedule-cron"
      />
      <SkText variant="caption" style={styles.help}>
        Five fields: minute, hour, day of month, month, day of week (0 or 7 is Sunday). A sixth field in front gives
        seconds. Runs must be at least {MIN_SCHEDULE_INTERVAL_MINUTES} minutes apart; use Run now for anything sooner.
      </SkText>
      <View style={styles.chips}>
        {STARTERS.map((s) => (
          <Pressable
            key={s.cron}
            accessibilityRole="button"
            accessibilityLabel={`Use ${s.label} (${s.cron})`}
            onPress={() => setCron(s.cron)}
            style={[styles.chip, cron.trim() === s.cron && styles.chipOn]}
          >
            <RadioMark on={cron.trim() === s.cron} />
            <SkText variant="caption" tone="ink" style={cron.trim() === s.cron && styles.chipTextOn}>
              {s.label}
            </SkText>
          </Pressable>
        ))}
      </View>
      <TextField
        label="Time zone"
        value={timeZone}
        onChangeText={setTimeZone}
        error={errorOf('timeZone')}
        autoCapitalize="none"
        testID="schedule-time-zone"
      />
      <View style={styles.chips}>
        {zones.map((zone) => (
          <Pressable
            key={zone}
            accessibilityRole="button"
            accessibilityLabel={`Use time zone ${zone}`}
            onPress={() => setTimeZone(zone)}
            style={[styles.chip, timeZone === zone && styles.chipOn]}
          >
            <RadioMark on={timeZone === zone} />
            <SkText variant="caption" tone="ink" style={timeZone === zone && styles.chipTextOn}>
              {zone}
              {zone === deviceZone && zone !== 'UTC' ? ' (this device)' : ''}
            </SkText>
          </Pressable>
        ))}
      </View>
      <View style={styles.preview}>
        <NextRuns
          nextRuns={preview.nextRuns}
          timeZone={timeZone}
          working={preview.working}
          testID="schedule-next-runs"
        />
      </View>
      <FormActions
        failure={other}
        saveLabel={schedule ? 'Save schedule' : 'Add schedule'}
        onSave={submit}
        busy={save.isPending}
        onCancel={onDone}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  editor: { gap: theme.space(3) },
  help: { lineHeight: 20 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: CHOICE_CHIP_STYLE,
  chipOn: { backgroundColor: theme.color.accentSoft, borderColor: theme.color.accent },
  chipTextOn: { fontFamily: theme.font.medium, color: theme.color.accent },
  preview: {
    padding: theme.space(3),
    borderRadius: theme.radius,
    backgroundColor: theme.color.paper,
    borderWidth: 1,
    borderColor: theme.color.rule,
  },
});
