import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import { formatComplexText } from '../../shared/format-complex-text';
import type { StepValue } from '../../shared/run-result';
import { FormulaText } from '../ui/formula-text';
import { SkText } from '../ui/sk-text';

/**
 * A composed subject evaluated step by step: each intermediate value as the library computed it
 * beside the reference's from the same input, and the first step that left the reference named,
 * since that step (not the input) is where the value went wrong. A table from the wide layout up,
 * one block per step on a phone.
 */
export function StepsTable({ steps, firstLeft }: { steps: readonly StepValue[]; firstLeft: number | null }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const verdict = (s: StepValue, i: number) =>
    i === firstLeft ? '← first step that left the reference' : s.left ? 'off the reference' : 'matches the reference';
  return (
    <View style={styles.root}>
      {firstLeft !== null && steps[firstLeft] ? (
        <SkText variant="body">
          The value first left the reference at step {firstLeft + 1},{' '}
          <FormulaText text={steps[firstLeft]!.text} typed style={styles.mono} />; the steps after it start from the
          library’s value.
        </SkText>
      ) : (
        <SkText variant="body">No step left the reference beyond the tolerance on its own.</SkText>
      )}
      <View role="table" aria-label="Steps of the subject">
        {wide ? (
          <View style={[styles.row, styles.head]} role="row">
            {['Step', 'Library', 'Reference', ''].map((h, i) => (
              <Text key={i} style={[styles.cell, styles.headText]} role="columnheader">
                {h}
              </Text>
            ))}
          </View>
        ) : null}
        {steps.map((s, i) => (
          <View
            key={i}
            style={[wide ? styles.row : styles.block, i === firstLeft ? styles.first : null]}
            role="row"
            testID={`step-${i}`}
          >
            <Text role="cell" style={[styles.cell, styles.mono]}>
              {i + 1}. <FormulaText text={s.text} typed />
            </Text>
            <Text role="cell" style={[styles.cell, styles.mono]}>
              {wide ? '' : 'library   '}
              {formatComplexText(s.library)}
            </Text>
            <Text role="cell" style={[styles.cell, styles.mono]}>
              {wide ? '' : 'reference '}
              {formatComplexText(s.reference)}
            </Text>
            <Text role="cell" style={[styles.cell, i === firstLeft ? styles.firstText : styles.note]}>
              {verdict(s, i)}
            </Text>
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
  row: {
    flexDirection: 'row',
    gap: theme.space(2),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
    paddingVertical: 4,
  },
  block: { gap: 2, borderBottomWidth: 1, borderBottomColor: theme.color.rule, paddingVertical: theme.space(2) },
  head: { borderBottomColor: theme.color.inkFaint },
  first: { backgroundColor: theme.color.dangerSoft },
  cell: { flex: 1, fontFamily: theme.font.regular, fontSize: 13, color: theme.color.ink },
  headText: { fontFamily: theme.font.medium, color: theme.color.inkSoft },
  mono: { fontFamily: theme.font.mono, fontSize: 13, color: theme.color.ink },
  note: { color: theme.color.inkSoft },
  firstText: { fontFamily: theme.font.medium, color: theme.color.danger },
});
