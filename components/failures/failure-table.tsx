import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { DecisionMark } from '../../shared/decision-mark';
import type { FailureView } from '../../shared/failure-view';
import { decisionMarkWords } from '../decisions/decision-mark-words';
import { describeFailure } from './describe-failure';
import { DIAGNOSIS_STYLES } from './diagnosis-styles';
import { FAILURE_COLUMNS, type FailureColumnId } from './failure-columns';
import { TABLE_BOX_STYLE } from '../ui/table-box-style';

/** The failure table for a wide screen: the chosen columns, each row a link to its case, marked when a decision covers it. */
export function FailureTable({
  failures,
  columns,
  decisions,
}: {
  failures: FailureView[];
  columns: FailureColumnId[];
  /** The decision in force on each row that has one, by failure number. */
  decisions: Record<string, DecisionMark>;
}) {
  const shown = FAILURE_COLUMNS.filter((c) => c.fixed || columns.includes(c.id));
  return (
    <View style={styles.table} role="table" aria-label="Failures">
      <View style={[styles.row, styles.head]} role="row">
        {shown.map((c) => (
          <Text key={c.id} role="columnheader" style={[styles.headText, { flex: c.flex }]}>
            {c.title}
          </Text>
        ))}
      </View>
      {failures.map((f) => (
        <Link key={f.id} href={`/failures/${f.id}`} asChild>
          <Pressable
            role="row"
            accessibilityRole="link"
            accessibilityLabel={`Failure ${f.id}: ${DIAGNOSIS_STYLES[describeFailure(f).tone].word} in ${f.suiteSlug} on ${f.targetName}, path ${f.pathName}${decisions[f.id] ? `; decided: ${decisionMarkWords(decisions[f.id]!)}` : ''}`}
            style={StyleSheet.flatten(styles.row)}
            testID={`failure-row-${f.id}`}
          >
            {shown.map((c) => (
              <View key={c.id} role="cell" style={[styles.cell, { flex: c.flex }]}>
                {c.cell(f, decisions[f.id])}
              </View>
            ))}
          </Pressable>
        </Link>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  table: TABLE_BOX_STYLE,
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    minHeight: 48,
    paddingHorizontal: theme.space(3),
    gap: theme.space(2),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  head: { backgroundColor: theme.color.paper, minHeight: 40 },
  headText: {
    fontFamily: theme.font.medium,
    fontSize: 12,
    color: theme.color.inkFaint,
    textTransform: 'uppercase',
    letterSpacing: 0.6,
  },
  cell: { paddingVertical: theme.space(2), minWidth: 0 },
});
