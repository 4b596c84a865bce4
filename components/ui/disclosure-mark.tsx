import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';

/**
 * The drawn chevron of a part that opens below its button: pointing down while closed, up while
 * open. Drawn rather than written with ↓ / ↑, which mean fewer and more (constants/glyphs.ts).
 */
export function DisclosureMark({ open, ink = theme.color.ink }: { open: boolean; ink?: string }) {
  return <View aria-hidden style={[styles.chevron, { borderColor: ink }, open ? styles.up : styles.down]} />;
}

const styles = StyleSheet.create({
  // Two borders of a small square, turned: ∨ at 45°, ∧ at −135°.
  chevron: { width: 8, height: 8, borderRightWidth: 2, borderBottomWidth: 2, marginHorizontal: 2 },
  down: { transform: [{ rotate: '45deg' }], marginTop: -4 },
  up: { transform: [{ rotate: '-135deg' }], marginTop: 4 },
});
