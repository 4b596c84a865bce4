import type { ReactNode } from 'react';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { DecisionMark } from '../../shared/decision-mark';
import type { FailureView } from '../../shared/failure-view';
import { DecisionMarker } from '../decisions/decision-marker';
import { SkText } from '../ui/sk-text';
import { describeFailure } from './describe-failure';
import { formatComplexText } from '../../shared/format-complex-text';
import { DiagnosisLabel } from './diagnosis-label';
import { LabelChips } from './label-chips';
import { formatUlps } from '../../shared/format-ulps';

export type FailureColumnId =
  'id' | 'suite' | 'target' | 'convention' | 'path' | 't' | 'z' | 'expected' | 'actual' | 'diagnosis' | 'ulps' | 'new';

const mono = (text: string) => <Text style={styles.mono}>{text}</Text>;
const plain = (text: string) => (
  <SkText variant="caption" tone="ink">
    {text}
  </SkText>
);

/**
 * The table's columns in order: title, relative width and how a cell reads (from the row and the
 * decision in force on it, if any). `id` and `diagnosis` cannot be hidden; the diagnosis cell
 * carries the decision's mark, so it shows whichever columns are chosen.
 */
export const FAILURE_COLUMNS: {
  id: FailureColumnId;
  title: string;
  flex: number;
  fixed?: true;
  cell: (f: FailureView, decision: DecisionMark | undefined) => ReactNode;
}[] = [
  {
    id: 'id',
    title: 'No.',
    flex: 0.8,
    fixed: true,
    cell: (f) => (
      <SkText variant="smallLabel" tone="accent" style={styles.link}>
        #{f.id}
      </SkText>
    ),
  },
  { id: 'suite', title: 'Suite', flex: 2.2, cell: (f) => plain(`${f.suiteSlug} v${f.suiteVersion}`) },
  { id: 'target', title: 'Target', flex: 1.5, cell: (f) => plain(f.targetName) },
  { id: 'convention', title: 'Convention', flex: 1.2, cell: (f) => plain(f.convention) },
  { id: 'path', title: 'Path', flex: 1.8, cell: (f) => plain(`${f.pathName}${f.label ? ` · ${f.label}` : ''}`) },
  { id: 't', title: 't', flex: 0.7, cell: (f) => mono(String(Number(f.t.toPrecision(4)))) },
  { id: 'z', title: 'z', flex: 2, cell: (f) => mono(formatComplexText(f.z)) },
  { id: 'expected', title: 'Expected', flex: 2, cell: (f) => mono(formatComplexText(f.expected)) },
  { id: 'actual', title: 'Library', flex: 2, cell: (f) => mono(formatComplexText(f.actual)) },
  {
    id: 'diagnosis',
    title: 'Diagnosis',
    flex: 1.8,
    fixed: true,
    cell: (f, decision) => (
      <View style={styles.diagnosis}>
        {f.labels.length > 0 ? <LabelChips labels={f.labels} /> : <DiagnosisLabel tone={describeFailure(f).tone} />}
        {decision ? <DecisionMarker mark={decision} /> : null}
      </View>
    ),
  },
  { id: 'ulps', title: 'Ulps', flex: 0.9, cell: (f) => mono(formatUlps(f.ulps)) },
  {
    id: 'new',
    title: 'Regression',
    flex: 0.9,
    cell: (f) => plain(f.isRegression ? COMPARISON_WORDS.regressionMark : '—'),
  },
];

const styles = StyleSheet.create({
  mono: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.ink },
  link: { textDecorationLine: 'underline' },
  diagnosis: { gap: theme.space(1), alignItems: 'flex-start' },
});
