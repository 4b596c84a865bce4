import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../constants/theme';

interface Props<T extends string> {
  label: string;
  options: readonly { value: T; text: string }[];
  value: T;
  onChange: (value: T) => void;
}

/** One choice among a few, as large chips; the chosen one carries a tick as well as the accent. */
export function ChoiceChips<T extends string>({ label, options, value, onChange }: Props<T>) {
  return (
    <View style={styles.box}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel={label}>
        {options.map((o) => (
          <Pressable
            key={o.value}
            accessibilityRole="radio"
            accessibilityLabel={`${label}: ${o.text}`}
            aria-checked={o.value === value}
            onPress={() => onChange(o.value)}
            style={[styles.chip, o.value === value && styles.on]}
          >
            <Text style={[styles.text, o.value === value && styles.textOn]}>
              {o.value === value ? '✓ ' : ''}
              {o.text}
            </Text>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(1) },
  label: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.inkSoft },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: { minHeight: 44, justifyContent: 'center', paddingHorizontal: theme.space(3), borderRadius: theme.radius, borderWidth: 1, borderColor: theme.color.rule, backgroundColor: theme.color.panel },
  on: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  text: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.ink },
  textOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
});
