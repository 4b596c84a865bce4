import { StyleSheet, Text } from 'react-native';

/**
 * Words a screen reader reads before what an element shows, kept off the screen (a 1 px box that
 * hides its overflow). A link whose visible words are short ("failures →") takes its context this
 * way rather than from a label of its own: a label replaces the visible words, and WCAG 2.5.3
 * (label in name) asks that the name keep them, so a person using voice control can say what
 * they see.
 */
export function ScreenReaderWords({ children }: { children: string }) {
  return <Text style={styles.offScreen}>{children}</Text>;
}

const styles = StyleSheet.create({
  offScreen: { position: 'absolute', width: 1, height: 1, margin: -1, overflow: 'hidden' },
});
