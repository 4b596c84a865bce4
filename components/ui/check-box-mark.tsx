import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';

/**
 * The drawn box of an on/off choice: empty when off, filled with the accent and a tick drawn from
 * two borders when on. A shape rather than the ✓ glyph, which means "passed" everywhere else
 * (constants/glyphs.ts).
 */
export function CheckBoxMark({ on }: { on: boolean }) {
  return (
    <View style={[styles.box, on && styles.boxOn]} aria-hidden>
      {on ? <View style={styles.tick} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    width: 22,
    height: 22,
    borderRadius: 4,
    borderWidth: 2,
    borderColor: theme.color.inkSoft,
    backgroundColor: theme.color.panel,
    alignItems: 'center',
    justifyContent: 'center',
  },
  boxOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  // A short stroke and a long one at right angles, turned 45°: the usual tick.
  tick: {
    width: 6,
    height: 12,
    marginTop: -2,
    borderRightWidth: 2,
    borderBottomWidth: 2,
    borderColor: theme.color.accentInk,
    transform: [{ rotate: '45deg' }],
  },
});
