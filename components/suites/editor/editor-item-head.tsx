import { StyleSheet, View } from 'react-native';
import { RuleLines } from '../../ui/rule-lines';
import { SkText } from '../../ui/sk-text';
import { SmallButton } from '../../ui/small-button';

/**
 * The head of one item of a list in the suite form (a path, a property check, a counterpart):
 * its name, a button that removes it, and the rules broken by the item as a whole.
 */
export function EditorItemHead({
  title,
  removeText,
  removeLabel,
  onRemove,
  rules,
}: {
  /** "Path 2": also the prefix of each rule line. */
  title: string;
  removeText: string;
  removeLabel: string;
  onRemove: () => void;
  rules: string[];
}) {
  return (
    <>
      <View style={styles.head}>
        <SkText variant="label">{title}</SkText>
        <SmallButton label={removeText} accessibilityLabel={removeLabel} onPress={onRemove} danger />
      </View>
      <RuleLines rules={rules.map((r) => `${title} ${r}`)} />
    </>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
});
