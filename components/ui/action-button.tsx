import { useRef } from 'react';
import { ActivityIndicator, Pressable, StyleSheet, Text, type View } from 'react-native';
import { carriedFocus } from './carried-focus';
import { useMountFocus } from './use-mount-focus';
import { theme } from '../../constants/theme';

interface Props {
  label: string;
  onPress: () => void;
  busy?: boolean;
  disabled?: boolean;
  tone?: 'primary' | 'quiet';
  accessibilityLabel?: string;
  /** A press mounts a new screen with this button on it, which then takes the focus (`carriedFocus`). */
  carriesFocus?: boolean;
  /** Takes the focus when it appears: it replaced the control that had it (an ask-first question's buttons). */
  focusOnMount?: boolean;
}

export function ActionButton({
  label,
  onPress,
  busy = false,
  disabled = false,
  tone = 'primary',
  accessibilityLabel,
  carriesFocus = false,
  focusOnMount = false,
}: Props) {
  const inactive = disabled || busy;
  const name = accessibilityLabel ?? label;
  const node = useRef<View>(null);
  useMountFocus(() => (focusOnMount || (carriesFocus && carriedFocus.take(name)) ? node.current : null));
  return (
    <Pressable
      ref={node}
      accessibilityRole="button"
      accessibilityLabel={name}
      aria-disabled={inactive}
      aria-busy={busy}
      disabled={inactive}
      onPress={() => {
        if (carriesFocus) carriedFocus.carry(name);
        onPress();
      }}
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
