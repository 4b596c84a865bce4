import { Pressable, StyleSheet } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';
import { CHIP_BOX_STYLE } from './chip-box-style';

/** An on/off choice with a box that shows a tick when on, so the state reads without colour. */
export function ToggleChip({
  label,
  value,
  onChange,
}: {
  label: string;
  value: boolean;
  onChange: (value: boolean) => void;
}) {
  return (
    <Pressable
      accessibilityRole="checkbox"
      accessibilityLabel={label}
      aria-checked={value}
      onPress={() => onChange(!value)}
      style={[styles.chip, value && styles.on]}
    >
      <SkText variant="caption" tone="ink" style={value && styles.textOn}>
        {value ? '✓' : '◊'} {label}
      </SkText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: {
    ...CHIP_BOX_STYLE,
    alignSelf: 'flex-start',
    backgroundColor: theme.color.panel,
  },
  on: { borderColor: theme.color.accent, backgroundColor: theme.color.accentSoft },
  textOn: { fontFamily: theme.font.medium, color: theme.color.accent },
});
