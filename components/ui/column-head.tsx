import type { ReactNode } from 'react';
import { StyleSheet, type StyleProp, type TextStyle } from 'react-native';
import { SkText } from './sk-text';

/** The heading of one column in the head row of a wide-screen table: small, faint, in capitals. */
export function ColumnHead({
  children,
  style,
  role,
}: {
  children: ReactNode;
  style?: StyleProp<TextStyle>;
  /** `columnheader` where the table is marked up as one for assistive tech. */
  role?: 'columnheader';
}) {
  return (
    <SkText variant="smallLabel" tone="inkFaint" role={role} style={[styles.head, style]}>
      {children}
    </SkText>
  );
}

const styles = StyleSheet.create({
  head: { textTransform: 'uppercase', letterSpacing: 0.8 },
});
