import { ActivityIndicator, Pressable, StyleSheet, Text } from 'react-native';
import { theme } from '../../constants/theme';

interface Props {
  label: string;
  onPress: () => void;
  busy?: boolean;
  disabled?: boolean;
  tone?: 'primary' | 'quiet';
  accessibilityLabel?: string;
}

export function ActionButton({
  label,
  onPress,
  busy = false,
  disabled = false,
  tone = 'primary',
  accessibilityLabel,
}: Props) {
  const inactive = disabled || busy;
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel ?? label}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      onPress={onPress}
      style={({ pressed }) => [
        styles.base,
        tone === 'primary' ? styles.primary : styles.quiet,
        pressed && styles.pressed,
        inactive && styles.inactive,
      ]}
    >
      {busy ? <ActivityIndicator color={tone === 'primary' ? theme.color.accentInk : theme.color.accent} /> : null}
      <Text style={[styles.label, tone === 'primary' ? styles.primaryLabel : styles.quietLabel]}>{label}</Text>
    </Pressable>
  );
}

const styles = StyleSheet.create({
  base: {
    minHeight: theme.touch,
    paddingHorizontal: theme.space(5),
    borderRadius: theme.radius,
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'center',
    gap: theme.space(2),
  },
  primary: { backgroundColor: theme.color.accent },
  quiet: { backgroundColor: 'transparent', borderWidth: 1, borderColor: theme.color.control },
  pressed: { opacity: 0.85 },
  inactive: { opacity: 0.6 },
  label: { fontFamily: theme.font.medium, fontSize: theme.size.body },
  primaryLabel: { color: theme.color.accentInk },
  quietLabel: { color: theme.color.ink },
});
