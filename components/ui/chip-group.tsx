import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';
import { CHOICE_CHIP_STYLE } from './choice-chip-style';
import { RadioMark } from './radio-mark';
import { useRadioKeys } from './use-radio-keys';

interface Props<V extends string | undefined> {
  label: string;
  /** A value may be `undefined` for an "any" chip that clears a filter. A glyph keeps its one meaning (constants/glyphs.ts). */
  options: readonly { value: V; text: string; glyph?: string }[];
  value: V;
  onChange: (value: V) => void;
  /** The radio group's accessible name, when it should differ from the visible label. */
  groupLabel?: string;
  /**
   * Draws no label above the chips, where a column heading already names them on every row (the
   * users table on a wide screen). The accessible names keep it: the group's and each chip's.
   */
  labelHidden?: boolean;
}

/**
 * One choice among a few, as large chips: a radio group (one tab stop, arrow keys move and choose,
 * Space chooses: `useRadioKeys`) whose chosen chip carries a filled ring as well as the accent.
 */
export function ChipGroup<V extends string | undefined>({
  label,
  options,
  value,
  onChange,
  groupLabel,
  labelHidden = false,
}: Props<V>) {
  const names = options.map((o) => `${label}: ${o.text}`);
  const radio = useRadioKeys(
    options.length,
    options.findIndex((o) => o.value === value),
    (index) => {
      const option = options[index];
      if (option && option.value !== value) onChange(option.value);
    },
    names,
  );
  return (
    <View style={styles.group}>
      {labelHidden ? null : (
        <SkText variant="smallLabel" style={styles.label}>
          {label}
        </SkText>
      )}
      <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel={groupLabel ?? label}>
        {options.map((o, index) => {
          const on = o.value === value;
          return (
            <Pressable
              key={o.value ?? '(any)'}
              {...radio(index)}
              accessibilityRole="radio"
              accessibilityLabel={names[index]}
              aria-checked={on}
              style={[styles.chip, on && styles.chipOn]}
            >
              <RadioMark on={on} inverse={on} />
              <SkText variant="caption" tone="ink" style={on && styles.chipTextOn}>
                {o.glyph ? `${o.glyph} ` : ''}
                {o.text}
              </SkText>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  // Never wider than its row, so the chips wrap instead of running off a phone's edge.
  group: { gap: theme.space(1), maxWidth: '100%' },
  label: { letterSpacing: 0.3 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: CHOICE_CHIP_STYLE,
  chipOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  chipTextOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
});
