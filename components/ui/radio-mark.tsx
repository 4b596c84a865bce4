import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';

/**
 * The drawn mark of a single choice: a ring, filled when chosen. A shape rather than a glyph, so the
 * chosen option reads without colour and no glyph takes "chosen" as a second meaning.
 */
export function RadioMark({ on, inverse = false }: { on: boolean; inverse?: boolean }) {
  const ink = inverse ? theme.color.accentInk : theme.color.ink;
  return (
    <View style={[styles.ring, { borderColor: ink }]} aria-hidden>
      {on ? <View testID="chosen-mark" style={[styles.dot, { backgroundColor: ink }]} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  ring: { width: 14, height: 14, borderRadius: 7, borderWidth: 2, alignItems: 'center', justifyContent: 'center' },
  dot: { width: 6, height: 6, borderRadius: 3 },
});
