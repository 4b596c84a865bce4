import { useState } from 'react';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import { StyleSheet, View } from 'react-native';
import type { FailureFilters } from '../../client/failure-filters';
import { theme } from '../../constants/theme';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';
import { failureQuery } from '../../shared/schemas/failure-query';
import { ActionButton } from '../ui/action-button';
import { carriedFocus } from '../ui/carried-focus';
import { ChipGroup } from '../ui/chip-group';
import { DisclosureToggle } from '../ui/disclosure-toggle';
import { SkText } from '../ui/sk-text';
import { CLASS_WORDS } from '../runs/class-words';
import { DIAGNOSIS_STYLES } from './diagnosis-styles';
import { TextField } from '../ui/text-field';

type TextKey = 'run' | 'suite' | 'target' | 'fn';
const TEXT_FIELDS: { key: TextKey; label: string }[] = [
  { key: 'run', label: 'Run id' },
  { key: 'suite', label: 'Suite' },
  { key: 'target', label: 'Target' },
  { key: 'fn', label: 'Function' },
];
/**
 * Whether the folded panel was last left open on a phone. Each filter change is a new entry in
 * the history, which mounts the screen afresh; without this the panel would fold after every chip.
 */
let openOnPhone: boolean | null = null;

const draftOf = (f: FailureFilters): Record<TextKey, string> => ({
  run: f.run ?? '',
  suite: f.suite ?? '',
  target: f.target ?? '',
  fn: f.fn ?? '',
});

/**
 * The failure table's filters. Typed filters apply together ("Apply"), each checked with the
 * server's schema first and its rule shown beside the field; chips apply at once. On a phone
 * the panel folds away behind a button that says how many filters are on.
 */
export function FailureFiltersPanel({
  filters,
  onChange,
  compact,
  refused = {},
}: {
  filters: FailureFilters;
  onChange: (next: FailureFilters) => void;
  compact: boolean;
  /** Rules the server gave for applied filters (filter-errors.ts), shown beside their fields until the field changes. */
  refused?: Partial<Record<string, string>>;
}) {
  const [openState, setOpenState] = useState(compact ? (openOnPhone ?? false) : true);
  // A refused filter is shown beside its field, so the folded panel opens for it.
  const open = openState || Object.keys(refused).length > 0;
  const setOpen = (next: boolean) => {
    if (compact) openOnPhone = next;
    setOpenState(next);
  };
  const [draft, setDraft] = useState(() => draftOf(filters));
  const [errors, setErrors] = useState<Partial<Record<TextKey, string>>>({});
  // A link or the back button can change the filters under the form: show what applies.
  const applied = JSON.stringify(draftOf(filters));
  // Adjusted while rendering rather than in an effect, so the form never shows a stale draft for one frame.
  const [shownApplied, setShownApplied] = useState(applied);
  if (applied !== shownApplied) {
    setShownApplied(applied);
    setDraft(JSON.parse(applied) as Record<TextKey, string>);
  }

  const on = (Object.keys(filters) as (keyof FailureFilters)[]).filter(
    (k) => k !== 'sort' && filters[k] !== undefined,
  ).length;
  const apply = () => {
    const next: FailureFilters = { ...filters };
    const found: Partial<Record<TextKey, string>> = {};
    for (const { key } of TEXT_FIELDS) {
      const text = draft[key].trim();
      if (!text) {
        delete next[key];
        continue;
      }
      const parsed = failureQuery.safeParse({ [key]: text });
      if (parsed.success) next[key] = parsed.data[key] as string;
      else found[key] = parsed.error.issues[0]?.message ?? 'is invalid';
    }
    setErrors(found);
    if (Object.keys(found).length === 0) onChange(next);
  };
  const set = <K extends keyof FailureFilters>(key: K, value: FailureFilters[K]) => {
    const next = { ...filters };
    if (value === undefined) delete next[key];
    else next[key] = value;
    onChange(next);
  };

  return (
    <View style={styles.panel}>
      {compact ? (
        <DisclosureToggle
          open={open}
          onToggle={() => setOpen(!open)}
          accessibilityLabel={`Filters, ${on} on`}
          style={styles.toggle}
        >
          <SkText variant="label">Filters{on ? ` · ${on} on` : ''}</SkText>
        </DisclosureToggle>
      ) : null}
      {open ? (
        <View style={styles.body}>
          <View style={styles.fields}>
            {TEXT_FIELDS.map(({ key, label }) => (
              <View key={key} style={compact ? styles.fieldFull : styles.field}>
                <TextField
                  label={label}
                  value={draft[key]}
                  onChangeText={(text) => {
                    setDraft({ ...draft, [key]: text });
                    if (errors[key]) setErrors({ ...errors, [key]: undefined });
                  }}
                  onSubmitEditing={apply}
                  carriesFocus
                  autoCapitalize="none"
                  error={errors[key] ?? (draft[key].trim() === draftOf(filters)[key] ? refused[key] : undefined)}
                />
              </View>
            ))}
          </View>
          <View style={styles.actions}>
            <ActionButton label="Apply filters" onPress={apply} carriesFocus />
            {on > 0 ? (
              <ActionButton
                label="Clear all"
                tone="quiet"
                onPress={() => {
                  setErrors({});
                  // "Clear all" is gone from the screen the change mounts: focus lands on "Apply filters".
                  carriedFocus.carry('Apply filters');
                  onChange(filters.sort ? { sort: filters.sort } : {});
                }}
              />
            ) : null}
          </View>
          <ChipGroup
            label="Class"
            value={filters.class}
            onChange={(v) => set('class', v)}
            options={[
              { value: undefined, text: 'any' },
              ...CLASS_WORDS.map((c) => ({ value: c.key, text: c.findings(2), glyph: c.glyph })),
            ]}
          />
          <ChipGroup
            label="Diagnosis"
            value={filters.diagnosis}
            onChange={(v) => set('diagnosis', v)}
            options={[
              { value: undefined, text: 'any' },
              ...[...DIAGNOSIS_KINDS, 'error' as const, 'skipped' as const].map((k) => ({
                value: k,
                text: DIAGNOSIS_STYLES[k].word,
                glyph: DIAGNOSIS_STYLES[k].glyph,
              })),
            ]}
          />
          <View style={compact ? styles.stack : styles.side}>
            <ChipGroup
              label="Status"
              value={filters.status}
              onChange={(v) => set('status', v)}
              options={[
                { value: undefined, text: 'any' },
                { value: 'new', text: 'regressions', glyph: COMPARISON_WORDS.more },
                { value: 'known', text: 'known' },
                { value: 'accepted', text: 'accepted', glyph: '✓' },
              ]}
            />
            <ChipGroup
              label="Convention"
              value={filters.convention}
              onChange={(v) => set('convention', v)}
              options={[
                { value: undefined, text: 'any' },
                { value: 'signed-zero', text: 'signed zero' },
                { value: 'counter-clockwise', text: 'counter-clockwise' },
              ]}
            />
          </View>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  panel: { gap: theme.space(3) },
  toggle: { backgroundColor: theme.color.panel },
  body: {
    gap: theme.space(4),
    padding: theme.space(4),
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    backgroundColor: theme.color.panel,
  },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
  field: { flexGrow: 1, flexBasis: 200 },
  fieldFull: { width: '100%' },
  actions: { flexDirection: 'row', gap: theme.space(3), flexWrap: 'wrap' },
  stack: { gap: theme.space(4) },
  side: { flexDirection: 'row', gap: theme.space(8), flexWrap: 'wrap' },
});
