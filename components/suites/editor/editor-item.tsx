import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { theme } from '../../../constants/theme';
import { RuleLines } from '../../ui/rule-lines';
import { SkText } from '../../ui/sk-text';
import { SmallButton } from '../../ui/small-button';

/**
 * One item of a list in the suite form (a path, a property check, a counterpart): a ruled box
 * named for screen readers, with its name, a button that removes it, the rules broken by the item
 * as a whole, and its fields.
 */
export function EditorItem({
  title,
  removeText,
  removeLabel,
  onRemove,
  rules,
  children,
}: {
  /** "Path 2": the box's accessible name and the prefix of each rule line. */
  title: string;
  removeText: string;
  removeLabel: string;
  onRemove: () => void;
  rules: string[];
  children: ReactNode;
}) {
  return (
    <View style={styles.box} accessibilityLabel={title}>
      <View style={styles.head}>
        <SkText variant="label">{title}</SkText>
        <SmallButton label={removeText} accessibilityLabel={removeLabel} onPress={onRemove} danger />
      </View>
      <RuleLines rules={rules.map((r) => `${title} ${r}`)} />
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3), borderTopWidth: 1, borderTopColor: theme.color.rule, paddingTop: theme.space(3) },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
});
