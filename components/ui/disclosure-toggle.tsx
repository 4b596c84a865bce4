import type { ReactNode } from 'react';
import { Pressable, StyleSheet, type StyleProp, type ViewStyle } from 'react-native';
import { theme } from '../../constants/theme';
import { DisclosureMark } from './disclosure-mark';

/**
 * A ruled button that opens and closes a part of the screen below it: one touch target tall, it tells
 * assistive tech whether that part is open, and draws a chevron that says it to the eye. The words are the caller's.
 */
export function DisclosureToggle({
  open,
  onToggle,
  accessibilityLabel,
  style,
  children,
}: {
  open: boolean;
  onToggle: () => void;
  accessibilityLabel: string;
  /** Additions to the ruled box, e.g. a background or how it sits in its row. */
  style?: StyleProp<ViewStyle>;
  children: ReactNode;
}) {
  return (
    <Pressable
      accessibilityRole="button"
      accessibilityLabel={accessibilityLabel}
      aria-expanded={open}
      onPress={onToggle}
      style={[styles.toggle, style]}
    >
      <DisclosureMark open={open} />
      {children}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  toggle: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(2),
    paddingHorizontal: theme.space(4),
    borderWidth: 1,
    borderColor: theme.color.control,
    borderRadius: theme.radius,
  },
});
