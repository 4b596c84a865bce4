import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';
import { spaceToggles } from './space-toggles';

/**
 * A switch that says its state in words as well as by position and colour. The word stands beside
 * the switch, not inside it: inside, it would be visible text missing from the switch's name
 * ("Quiet" in a switch named "Mail me regressions of …", WCAG 2.5.3); the name stays what the
 * switch does and `aria-checked` its state. Space toggles it, as it does a native check box.
 */
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
    <View style={[styles.row, disabled && styles.disabled]}>
      <Pressable
        accessibilityRole="switch"
        accessibilityLabel={accessibilityLabel}
        aria-checked={value}
        aria-disabled={disabled}
        disabled={disabled}
        onPress={() => onChange(!value)}
        {...(disabled ? {} : spaceToggles(() => onChange(!value)))}
        style={styles.hit}
      >
        <View style={[styles.track, value ? styles.trackOn : styles.trackOff]}>
          <View style={[styles.knob, value ? styles.knobOn : null]} />
        </View>
      </Pressable>
      <SkText variant="smallLabel" style={[styles.word, value ? styles.wordOn : null]}>
        {value ? onWord : offWord}
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', alignItems: 'center', gap: theme.space(2), paddingRight: theme.space(1) },
  hit: { minHeight: theme.touch, justifyContent: 'center' },
  disabled: { opacity: 0.6 },
  track: { width: 44, height: 26, borderRadius: 13, padding: 3, justifyContent: 'center' },
  trackOn: { backgroundColor: theme.color.accent },
  trackOff: { backgroundColor: theme.color.control },
  knob: { width: 20, height: 20, borderRadius: 10, backgroundColor: theme.color.panel },
  knobOn: { alignSelf: 'flex-end' },
  word: { minWidth: 48 },
  wordOn: { color: theme.color.accent },
});
