import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';
import { CHIP_BOX_STYLE } from './chip-box-style';

interface Props<V extends string | undefined> {
  label: string;
  /** A value may be `undefined` for an "any" chip that clears a filter. */
  options: readonly { value: V; text: string; glyph?: string }[];
  value: V;
  onChange: (value: V) => void;
  /** The radio group's accessible name, when it should differ from the visible label. */
  groupLabel?: string;
}

/** One choice among a few, as large chips: a radio group whose checked chip carries a ✓ as well as the accent. */
export function ChipGroup<V extends string | undefined>({ label, options, value, onChange, groupLabel }: Props<V>) {
  return (
    <View style={styles.group}>
      <SkText variant="smallLabel" style={styles.label}>
        {label}
      </SkText>
      <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel={groupLabel ?? label}>
        {options.map((o) => {
          const on = o.value === value;
          return (
            <Pressable
              key={o.value ?? '(any)'}
              accessibilityRole="radio"
              accessibilityLabel={`${label}: ${o.text}`}
              aria-checked={on}
              onPress={() => onChange(o.value)}
              style={[styles.chip, on && styles.chipOn]}
            >
              <SkText variant="caption" tone="ink" style={on && styles.chipTextOn}>
                {on ? '✓ ' : o.glyph ? `${o.glyph} ` : ''}
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
  chip: {
    ...CHIP_BOX_STYLE,
    backgroundColor: theme.color.panel,
  },
  chipOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  chipTextOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
});
