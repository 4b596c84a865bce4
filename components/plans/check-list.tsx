import { useState } from 'react';
import { Pressable, StyleSheet, Text, TextInput, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import { INPUT_BOX_STYLE } from '../ui/input-box-style';
import { RuleLines } from '../ui/rule-lines';
import { SkText } from '../ui/sk-text';
import { CHIP_BOX_STYLE } from '../ui/chip-box-style';
import { CheckBoxMark } from '../ui/check-box-mark';
import { spaceToggles } from '../ui/space-toggles';

export interface CheckListItem {
  key: string;
  title: string;
  /** A second line: an id, a version. */
  detail?: string;
  /** Why it cannot be chosen, shown in words; a chosen item stays removable. */
  blocked?: string;
}

interface Props {
  label: string;
  items: CheckListItem[];
  selected: string[];
  onChange: (selected: string[]) => void;
  /** The broken rule, shown under the list. */
  error?: string;
  /** Shows a filter once the list is longer than this. */
  filterFrom?: number;
  testID?: string;
}

/** A labelled list of checkboxes (two columns on a wide screen), with a filter for long lists. */
export function CheckList({ label, items, selected, onChange, error, filterFrom = 8, testID }: Props) {
  const [filter, setFilter] = useState('');
  const wide = useWindowDimensions().width >= theme.wide;
  const chosen = new Set(selected);
  const needle = filter.trim().toLowerCase();
  const shown = needle
    ? items.filter((i) => `${i.title} ${i.key} ${i.detail ?? ''}`.toLowerCase().includes(needle))
    : items;
  const choosable = shown.filter((i) => !i.blocked).map((i) => i.key);
  const toggle = (key: string) => onChange(chosen.has(key) ? selected.filter((k) => k !== key) : [...selected, key]);

  return (
    <View style={styles.field} testID={testID}>
      <View style={styles.head}>
        <SkText variant="smallLabel" style={styles.label}>
          {label}
        </SkText>
        <SkText variant="caption" tone="inkFaint">
          {selected.length} of {items.filter((i) => !i.blocked).length} chosen
        </SkText>
      </View>
      {items.length > filterFrom ? (
        <View style={styles.tools}>
          <TextInput
            accessibilityLabel={`Filter ${label.toLowerCase()}`}
            placeholder="Filter…"
            placeholderTextColor={theme.color.inkFaint}
            value={filter}
            onChangeText={setFilter}
            autoCapitalize="none"
            autoCorrect={false}
            style={styles.filter}
          />
          <Pressable
            accessibilityRole="button"
            accessibilityLabel={`All shown: choose all ${label.toLowerCase()} shown`}
            onPress={() => onChange(Array.from(new Set([...selected, ...choosable])))}
            style={styles.tool}
          >
            <SkText variant="smallLabel" tone="ink">
              All shown
            </SkText>
          </Pressable>
          <Pressable
            accessibilityRole="button"
            accessibilityLabel={`Clear ${label.toLowerCase()}`}
            onPress={() => onChange([])}
            style={styles.tool}
          >
            <SkText variant="smallLabel" tone="ink">
              Clear
            </SkText>
          </Pressable>
        </View>
      ) : null}
      <View style={[styles.list, error ? styles.listError : null]} role="group" aria-label={label}>
        {shown.length === 0 ? (
          <SkText variant="caption" style={styles.none}>
            {items.length === 0 ? 'Nothing to choose from yet.' : 'Nothing matches the filter.'}
          </SkText>
        ) : null}
        {shown.map((item) => {
          const on = chosen.has(item.key);
          const disabled = Boolean(item.blocked) && !on;
          return (
            <Pressable
              key={item.key}
              accessibilityRole="checkbox"
              accessibilityLabel={item.title}
              aria-checked={on}
              aria-disabled={disabled}
              disabled={disabled}
              onPress={() => toggle(item.key)}
              {...spaceToggles(() => toggle(item.key))}
              style={[styles.item, wide && styles.itemWide, disabled && styles.itemDisabled]}
            >
              <CheckBoxMark on={on} />
              <View style={styles.words}>
                <SkText variant="body" numberOfLines={2}>
                  {item.title}
                </SkText>
                {item.detail ? (
                  <Text style={styles.detail} numberOfLines={1}>
                    {item.detail}
                  </Text>
                ) : null}
                {item.blocked ? <Text style={styles.blocked}>− {item.blocked}</Text> : null}
              </View>
            </Pressable>
          );
        })}
      </View>
      <RuleLines rules={error ? [`${label} ${error}`] : []} />
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: theme.space(2) },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: theme.space(2) },
  label: { letterSpacing: 0.3 },
  tools: { flexDirection: 'row', gap: theme.space(2), alignItems: 'center' },
  filter: {
    flex: 1,
    minWidth: 0,
    ...INPUT_BOX_STYLE,
  },
  tool: {
    ...CHIP_BOX_STYLE,
  },
  list: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    backgroundColor: theme.color.panel,
    maxHeight: 420,
    overflow: 'scroll',
  },
  listError: { borderColor: theme.color.danger, borderWidth: 2 },
  none: { padding: theme.space(3) },
  item: {
    width: '100%',
    minHeight: 48,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingHorizontal: theme.space(3),
    paddingVertical: theme.space(2),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  itemWide: { width: '50%' },
  itemDisabled: { opacity: 0.6 },
  words: { flex: 1, minWidth: 0 },
  detail: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  blocked: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.danger },
});
