import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import { SkText } from '../ui/sk-text';
import { describeMatrixCell, type MatrixCellWords } from './describe-matrix-cell';
import { failuresHref } from './failures-href';
import { OUTCOME_TONE } from './outcome-tone';
import { CHIP_BOX_STYLE } from '../ui/chip-box-style';

const SUITE_COLUMN = 300;
const TARGET_COLUMN_MIN = 190;
const byName = (a: string, b: string) => a.localeCompare(b, 'en', { numeric: true });

/**
 * A run's matrix, suite × target. Each cell says its outcome in glyphs and words (and colour);
 * a cell with failures, errors or skips links to the failure table filtered to that pair. Wide
 * screens get the grid; phones get one card per suite with a row per target.
 */
export function RunMatrix({ runId, cells }: { runId: string; cells: RunMatrixCell[] }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const [onlyProblems, setOnlyProblems] = useState(false);
  const [boxWidth, setBoxWidth] = useState(0);
  const targets = [...new Set(cells.map((c) => c.target))].sort(byName);
  const described = new Map(
    cells.map((c) => [`${c.suite}\u0000${c.target}`, { cell: c, words: describeMatrixCell(c) }]),
  );
  const allSuites = [...new Set(cells.map((c) => c.suite))].sort(byName);
  const needsLook = (suite: string) =>
    targets.some((t) => {
      const d = described.get(`${suite}\u0000${t}`);
      return d !== undefined && d.words.tone !== 'pass';
    });
  const suites = onlyProblems ? allSuites.filter(needsLook) : allSuites;

  const tally = { pass: 0, fail: 0, error: 0, other: 0 };
  for (const { words } of described.values()) {
    if (words.tone === 'pass') tally.pass += 1;
    else if (words.tone === 'fail') tally.fail += 1;
    else if (words.tone === 'error') tally.error += 1;
    else tally.other += 1;
  }

  const cellView = (suite: string, target: string, layout: 'grid' | 'row') => {
    const entry = described.get(`${suite}\u0000${target}`);
    if (!entry) {
      return (
        <View
          key={target}
          style={layout === 'grid' ? [styles.gridCell, styles.absent] : [styles.rowCell, styles.absent]}
          accessibilityLabel={`${suite} on ${target}: not part of this run`}
        >
          {layout === 'row' ? (
            <SkText variant="mono" tone="inkSoft" style={styles.rowTarget}>
              {target}
            </SkText>
          ) : null}
          <SkText variant="caption">— not in this run</SkText>
        </View>
      );
    }
    return <MatrixCellView key={target} runId={runId} cell={entry.cell} words={entry.words} layout={layout} />;
  };

  // A definite width for the grid: in a horizontal scroller, flexible columns would otherwise size to their longest text.
  const gridWidth = Math.max(boxWidth, SUITE_COLUMN + targets.length * TARGET_COLUMN_MIN);

  return (
    <View style={styles.box} onLayout={(e) => setBoxWidth(e.nativeEvent.layout.width)}>
      <SkText variant="caption" style={styles.summary}>
        {allSuites.length} suite{allSuites.length === 1 ? '' : 's'} × {targets.length} target
        {targets.length === 1 ? '' : 's'}: ✓ {tally.pass} passed · ❌ {tally.fail} with failures · ◊ {tally.error} error
        {tally.other ? ` · ${tally.other} not finished or cancelled` : ''}
      </SkText>
      <Pressable
        accessibilityRole="switch"
        accessibilityLabel="Show only suites that need a look"
        aria-checked={onlyProblems}
        onPress={() => setOnlyProblems((v) => !v)}
        style={[styles.toggle, onlyProblems && styles.toggleOn]}
      >
        <SkText variant="caption" tone="ink" style={onlyProblems && styles.toggleTextOn}>
          {onlyProblems ? '✓ ' : ''}Only suites that need a look
        </SkText>
      </Pressable>
      {suites.length === 0 ? <SkText variant="caption">Every suite passed on every target.</SkText> : null}
      {wide ? (
        <ScrollView horizontal contentContainerStyle={styles.gridScroll}>
          <View style={[styles.grid, { width: gridWidth }]} role="table" aria-label="Run matrix">
            <View style={styles.gridRow} role="row">
              <SkText
                variant="smallLabel"
                tone="inkFaint"
                role="columnheader"
                style={[styles.gridHead, styles.suiteCol]}
              >
                Suite ↓ · target →
              </SkText>
              {targets.map((t) => (
                <SkText
                  variant="smallLabel"
                  tone="inkFaint"
                  key={t}
                  role="columnheader"
                  style={[styles.gridHead, styles.targetCol]}
                >
                  {t}
                </SkText>
              ))}
            </View>
            {suites.map((suite) => (
              <View key={suite} style={styles.gridRow} role="row">
                <SkText variant="mono" role="rowheader" style={styles.suiteCol}>
                  {suite}
                </SkText>
                {targets.map((t) => (
                  <View key={t} role="cell" style={styles.targetCol}>
                    {cellView(suite, t, 'grid')}
                  </View>
                ))}
              </View>
            ))}
          </View>
        </ScrollView>
      ) : (
        suites.map((suite) => (
          <View key={suite} style={styles.card}>
            <SkText variant="mono" accessibilityRole="header">
              {suite}
            </SkText>
            {targets.map((t) => cellView(suite, t, 'row'))}
          </View>
        ))
      )}
    </View>
  );
}

function MatrixCellView({
  runId,
  cell,
  words,
  layout,
}: {
  runId: string;
  cell: RunMatrixCell;
  words: MatrixCellWords;
  layout: 'grid' | 'row';
}) {
  const tone = OUTCOME_TONE[words.tone];
  const frame = StyleSheet.flatten([
    layout === 'grid' ? styles.gridCell : styles.rowCell,
    { backgroundColor: tone.soft, borderLeftColor: tone.edge },
  ]);
  const content = (
    <>
      {layout === 'row' ? (
        <SkText variant="mono" tone="inkSoft" style={styles.rowTarget}>
          {cell.target}
        </SkText>
      ) : null}
      <View style={styles.cellWords}>
        <Text style={[styles.headline, { color: tone.ink }]}>{words.headline}</Text>
        {words.details.map((line, i) => (
          <SkText variant="caption" key={i} numberOfLines={3}>
            {line}
          </SkText>
        ))}
        {words.hasRows ? (
          <SkText variant="smallLabel" tone="accent">
            failures →
          </SkText>
        ) : null}
      </View>
    </>
  );
  if (!words.hasRows) {
    return (
      <View style={frame} accessibilityLabel={words.label} testID={`cell-${cell.suite}-${cell.target}`}>
        {content}
      </View>
    );
  }
  return (
    <Link href={failuresHref(runId, cell.suite, cell.target)} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={`${words.label}. Open these failures`}
        style={frame}
        testID={`cell-${cell.suite}-${cell.target}`}
      >
        {content}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  summary: { lineHeight: 20 },
  toggle: {
    alignSelf: 'flex-start',
    ...CHIP_BOX_STYLE,
    backgroundColor: theme.color.panel,
  },
  toggleOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  toggleTextOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
  gridScroll: { flexGrow: 1 },
  grid: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
  },
  gridRow: { flexDirection: 'row', alignItems: 'stretch', borderBottomWidth: 1, borderBottomColor: theme.color.rule },
  gridHead: { paddingVertical: theme.space(2), paddingHorizontal: theme.space(3) },
  suiteCol: {
    width: SUITE_COLUMN,
    paddingHorizontal: theme.space(3),
    paddingVertical: theme.space(2),
    alignSelf: 'center',
  },
  targetCol: { flex: 1, flexBasis: 0, minWidth: TARGET_COLUMN_MIN, padding: theme.space(1) },
  gridCell: {
    flex: 1,
    minHeight: theme.touch,
    padding: theme.space(2),
    borderLeftWidth: 4,
    borderRadius: 4,
    justifyContent: 'center',
  },
  rowCell: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    padding: theme.space(3),
    borderLeftWidth: 4,
    borderRadius: 4,
  },
  absent: { backgroundColor: theme.color.paper, borderLeftColor: theme.color.rule },
  rowTarget: { width: 130 },
  cellWords: { flex: 1, gap: 2 },
  headline: { fontFamily: theme.font.medium, fontSize: theme.size.body },
  card: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    padding: theme.space(3),
    gap: theme.space(2),
  },
});
