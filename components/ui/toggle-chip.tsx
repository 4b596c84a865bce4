import { Pressable, StyleSheet } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';
import { CHOICE_CHIP_STYLE } from './choice-chip-style';
import { CheckBoxMark } from './check-box-mark';
import { spaceToggles } from './space-toggles';

/** An on/off choice, a check box: a drawn box that shows a tick when on, so the state reads without colour; Space toggles it. */
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
      {...spaceToggles(() => onChange(!value))}
      style={[styles.chip, value && styles.on]}
    >
      <CheckBoxMark on={value} />
      <SkText variant="caption" tone="ink" style={value && styles.textOn}>
        {label}
      </SkText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  chip: { ...CHOICE_CHIP_STYLE, alignSelf: 'flex-start' },
  on: { borderColor: theme.color.accent, backgroundColor: theme.color.accentSoft },
  textOn: { fontFamily: theme.font.medium, color: theme.color.accent },
});
