import { useState } from 'react';
import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import type { RunFilters as Filters } from '../../client/use-runs';
import { theme } from '../../constants/theme';
import { RUN_STATUSES, RUN_TRIGGERS, type RunStatus, type RunTrigger } from '../../shared/run-status';
import { ChipGroup } from '../ui/chip-group';
import { DisclosureMark } from '../ui/disclosure-mark';
import { SkText } from '../ui/sk-text';

const STATUS_WORDS: Record<RunStatus, string> = {
  queued: '… queued',
  running: '↻ running',
  completed: 'completed',
  failed: '◊ run failed',
  cancelled: '× cancelled',
};
const TRIGGER_WORDS: Record<RunTrigger, string> = { schedule: 'scheduled', manual: 'by hand', api: 'via API' };

/**
 * The Runs list's filters: plan, status and trigger, each "any" or one value. On a phone they
 * fold behind one button that says which filters are on, so the runs start near the top.
 */
export function RunFilters({
  value,
  plans,
  onChange,
}: {
  value: Filters;
  plans: { id: string; name: string }[];
  onChange: (next: Filters) => void;
}) {
  const wide = useWindowDimensions().width >= theme.wide;
  const [open, setOpen] = useState(false);
  const planName = plans.find((p) => p.id === value.plan)?.name;
  const on = [
    value.plan ? (planName ?? 'one plan') : null,
    value.status ? STATUS_WORDS[value.status] : null,
    value.trigger ? TRIGGER_WORDS[value.trigger] : null,
  ].filter((x): x is string => x !== null);

  const chips = (
    <View style={styles.box}>
      <ChipGroup
        label="Plan"
        groupLabel="Plan filter"
        options={[{ value: undefined, text: 'any plan' }, ...plans.map((p) => ({ value: p.id, text: p.name }))]}
        value={value.plan}
        onChange={(plan) => onChange({ ...value, plan })}
      />
      <View style={styles.pair}>
        <ChipGroup
          label="Status"
          groupLabel="Status filter"
          options={[
            { value: undefined, text: 'any status' },
            ...RUN_STATUSES.map((s) => ({ value: s, text: STATUS_WORDS[s] })),
          ]}
          value={value.status}
          onChange={(status) => onChange({ ...value, status })}
        />
        <ChipGroup
          label="Trigger"
          groupLabel="Trigger filter"
          options={[
            { value: undefined, text: 'any trigger' },
            ...RUN_TRIGGERS.map((t) => ({ value: t, text: TRIGGER_WORDS[t] })),
          ]}
          value={value.trigger}
          onChange={(trigger) => onChange({ ...value, trigger })}
        />
      </View>
    </View>
  );
  if (wide) return chips;
  return (
    <View style={styles.box}>
      <Pressable
        accessibilityRole="button"
        aria-expanded={open}
        onPress={() => setOpen((v) => !v)}
        style={styles.toggle}
      >
        <DisclosureMark open={open} />
        <SkText variant="label">Filter runs</SkText>
        <SkText variant="caption" style={styles.summary} numberOfLines={2}>
          {on.length ? on.join(' · ') : 'all runs'}
        </SkText>
      </Pressable>
      {open ? chips : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  pair: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(6), rowGap: theme.space(3) },
  toggle: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingHorizontal: theme.space(3),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.control,
    backgroundColor: theme.color.panel,
  },
  summary: { flex: 1, textAlign: 'right' },
});
