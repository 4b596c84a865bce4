import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';

/** A page of its own outside the app's frame (sign-in, a mailed link): one card in the middle of the paper. */
export function CentredCard({ maxWidth, children }: { maxWidth: number; children: ReactNode }) {
  return (
    <View style={styles.page}>
      <View style={[styles.card, { maxWidth }]}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  page: {
    flex: 1,
    backgroundColor: theme.color.paper,
    justifyContent: 'center',
    alignItems: 'center',
    padding: theme.space(4),
  },
  card: {
    width: '100%',
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    padding: theme.space(6),
    gap: theme.space(5),
  },
});
