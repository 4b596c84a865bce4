import { StyleSheet, Text, View, type StyleProp, type TextStyle } from 'react-native';

/**
 * A name like "mathjs/number/predictable" that wraps after a slash instead of inside a word: a
 * browser finds no break opportunity at "/", so a narrow column cut "predic|table" in two. Each
 * part is its own box in a wrapping row; the whole name is one label for screen readers.
 */
export function SlashWrappedName({ name, style }: { name: string; style?: StyleProp<TextStyle> }) {
  const parts = name.split('/');
  return (
    <View style={styles.row} accessible accessibilityLabel={name} testID={`name-${name}`}>
      {parts.map((part, i) => (
        <Text key={i} style={style}>
          {part}
          {i < parts.length - 1 ? '/' : ''}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', minWidth: 0 },
});
