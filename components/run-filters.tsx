import { StyleSheet, View } from 'react-native';
import type { RunFilters as Filters } from '../client/use-runs';
import { theme } from '../constants/theme';
import { RUN_STATUSES, RUN_TRIGGERS, type RunStatus, type RunTrigger } from '../shared/run-status';
import { FilterChips } from './filter-chips';

const STATUS_WORDS: Record<RunStatus, string> = { queued: '… queued', running: '↻ running', completed: 'completed', failed: '◊ run failed', cancelled: '× cancelled' };
const TRIGGER_WORDS: Record<RunTrigger, string> = { schedule: 'scheduled', manual: 'by hand', api: 'via API' };

/** The Runs list's filters: plan, status and trigger, each "any" or one value. */
export function RunFilters({ value, plans, onChange }: { value: Filters; plans: { id: string; name: string }[]; onChange: (next: Filters) => void }) {
  return (
    <View style={styles.box}>
      <FilterChips
        label="Plan"
        options={[{ value: undefined, label: 'any plan' }, ...plans.map((p) => ({ value: p.id, label: p.name }))]}
        value={value.plan}
        onChange={(plan) => onChange({ ...value, plan })}
      />
      <View style={styles.pair}>
        <FilterChips
          label="Status"
          options={[{ value: undefined, label: 'any status' }, ...RUN_STATUSES.map((s) => ({ value: s, label: STATUS_WORDS[s] }))]}
          value={value.status}
          onChange={(status) => onChange({ ...value, status })}
        />
        <FilterChips
          label="Trigger"
          options={[{ value: undefined, label: 'any trigger' }, ...RUN_TRIGGERS.map((t) => ({ value: t, label: TRIGGER_WORDS[t] }))]}
          value={value.trigger}
          onChange={(trigger) => onChange({ ...value, trigger })}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  pair: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(6), rowGap: theme.space(3) },
});
