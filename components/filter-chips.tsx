import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../constants/theme';

/**
 * One filter as a row of chips, exactly one chosen ("any" clears it). The chosen chip carries a
 * tick as well as its colour.
 */
export function FilterChips<V extends string>({
  label,
  options,
  value,
  onChange,
}: {
  label: string;
  options: { value: V | undefined; label: string }[];
  value: V | undefined;
  onChange: (value: V | undefined) => void;
}) {
  return (
    <View style={styles.group}>
      <Text style={styles.label}>
        {label}
      </Text>
      <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel={`${label} filter`}>
        {options.map((option) => {
          const on = option.value === value;
          return (
            <Pressable
              key={option.value ?? '(any)'}
              accessibilityRole="radio"
              accessibilityLabel={`${label}: ${option.label}`}
              aria-checked={on}
              onPress={() => onChange(option.value)}
              style={[styles.chip, on && styles.chipOn]}
            >
              <Text style={[styles.chipText, on && styles.chipTextOn]}>
                {on ? '✓ ' : ''}
                {option.label}
              </Text>
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
  label: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.inkFaint, textTransform: 'uppercase', letterSpacing: 0.8 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: { minHeight: 44, justifyContent: 'center', paddingHorizontal: theme.space(3), borderRadius: theme.radius, borderWidth: 1, borderColor: theme.color.rule, backgroundColor: theme.color.panel },
  chipOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  chipText: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.ink },
  chipTextOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
});
