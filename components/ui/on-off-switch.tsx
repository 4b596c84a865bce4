import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';

/** A switch that says its state in words as well as by position and colour. */
export function OnOffSwitch({
  value,
  onChange,
  accessibilityLabel,
  onWord = 'On',
  offWord = 'Off',
  disabled = false,
}: {
  value: boolean;
  onChange: (next: boolean) => void;
  accessibilityLabel: string;
  onWord?: string;
  offWord?: string;
  disabled?: boolean;
}) {
  return (
    <Pressable
      accessibilityRole="switch"
      accessibilityLabel={accessibilityLabel}
      aria-checked={value}
      aria-disabled={disabled}
      disabled={disabled}
      onPress={() => onChange(!value)}
      style={[styles.hit, disabled && styles.disabled]}
    >
      <View style={[styles.track, value ? styles.trackOn : styles.trackOff]}>
        <View style={[styles.knob, value ? styles.knobOn : null]} />
      </View>
      <SkText variant="smallLabel" style={[styles.word, value ? styles.wordOn : null]}>
        {value ? onWord : offWord}
      </SkText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  hit: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(2),
    paddingRight: theme.space(1),
  },
  disabled: { opacity: 0.6 },
  track: { width: 44, height: 26, borderRadius: 13, padding: 3, justifyContent: 'center' },
  trackOn: { backgroundColor: theme.color.accent },
  trackOff: { backgroundColor: theme.color.control },
  knob: { width: 20, height: 20, borderRadius: 10, backgroundColor: theme.color.panel },
  knobOn: { alignSelf: 'flex-end' },
  word: { minWidth: 48 },
  wordOn: { color: theme.color.accent },
});
