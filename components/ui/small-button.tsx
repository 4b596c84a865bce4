import { Pressable, StyleSheet } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from './sk-text';

/** A secondary action inside a form (add a point, remove a path): quiet, but still a 44 px target. */
export function SmallButton({
  label,
  onPress,
  accessibilityLabel,
  danger = false,
}: {
  label: string;
  onPress: () => void;
  accessibilityLabel?: string;
  danger?: boolean;
}) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      onPress={onPress}
      style={({ pressed }) => [styles.button, pressed && styles.pressed]}
    >
      <SkText variant="smallLabel" tone="ink" style={danger && styles.danger}>
        {label}
      </SkText>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  button: {
    minHeight: 44,
    minWidth: 44,
    paddingHorizontal: theme.space(3),
    justifyContent: 'center',
    alignItems: 'center',
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.control,
    alignSelf: 'flex-start',
  },
  pressed: { backgroundColor: theme.color.paper },
  danger: { color: theme.color.danger },
});
