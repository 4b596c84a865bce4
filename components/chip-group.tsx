import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../constants/theme';

/** One choice among a few, as large chips: a radio group whose checked chip carries a ✓ as well as the accent. */
export function ChipGroup<T extends string>({ label, options, value, onChange }: { label: string; options: { value: T | undefined; text: string; glyph?: string }[]; value: T | undefined; onChange: (v: T | undefined) => void }) {
  return (
    <View style={styles.group}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel={label}>
        {options.map((o) => {
          const on = o.value === value;
          return (
            <Pressable
              key={o.value ?? 'any'}
              accessibilityRole="radio"
              accessibilityLabel={`${label}: ${o.text}`}
              aria-checked={on}
              onPress={() => onChange(o.value)}
              style={[styles.chip, on && styles.chipOn]}
            >
              <Text style={[styles.chipText, on && styles.chipTextOn]}>
                {on ? '✓ ' : o.glyph ? `${o.glyph} ` : ''}
                {o.text}
              </Text>
            </Pressable>
          );
        })}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  group: { gap: theme.space(1) },
  label: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.inkSoft, letterSpacing: 0.3 },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: { minHeight: 44, justifyContent: 'center', paddingHorizontal: theme.space(3), borderRadius: theme.radius, borderWidth: 1, borderColor: theme.color.rule, backgroundColor: theme.color.panel },
  chipOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  chipText: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.ink },
  chipTextOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
});
