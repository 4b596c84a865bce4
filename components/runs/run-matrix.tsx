import { Link } from 'expo-router';
import { Fragment, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import { CheckBoxMark } from '../ui/check-box-mark';
import { CHOICE_CHIP_STYLE } from '../ui/choice-chip-style';
import { spaceToggles } from '../ui/space-toggles';
import { SkText } from '../ui/sk-text';
import { ScreenReaderWords } from '../ui/screen-reader-words';
import { describeMatrixCell, type MatrixCellWords } from './describe-matrix-cell';
import { OUTCOME_GLYPH } from './outcome-glyph';
import { tallyCells } from './tally-cells';
import { tallyWords } from './tally-words';
import { DisclosureToggle } from '../ui/disclosure-toggle';
import { OUTCOME_TONE } from './outcome-tone';
import { plural } from '../../shared/plural';

const SUITE_COLUMN = 300;
const TARGET_COLUMN_MIN = 190;
const byName = (a: string, b: string) => a.localeCompare(b, 'en', { numeric: true });

/**
 * A run's matrix, suite × library version (a check each). Each cell says its outcome in glyphs
 * and words (and colour), and leads where its detail is (describe-matrix-cell.ts: the failure
 * table, or the page that says why nothing was checked). Wide screens get the grid. Phones get
 * the verdict and what needs a look first: one card per suite with a failing, erroring or
 * unfinished check, its passing checks one line each, and the suites that passed everywhere
 * folded into one line that opens them (the demo's largest run was 30,851 px tall as cards with
 * every check in full: tests/e2e/day-run-page.test.ts measures it).
 */
export function RunMatrix({ runId, cells }: { runId: string; cells: RunMatrixCell[] }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const [onlyProblems, setOnlyProblems] = useState(false);
  const [showPassed, setShowPassed] = useState(false);
  const [boxWidth, setBoxWidth] = useState(0);
  const targets = [...new Set(cells.map((c) => c.target))].sort(byName);
  const described = new Map(
    cells.map((c) => [`${c.suite}\u0000${c.target}`, { cell: c, words: describeMatrixCell(c, runId) }]),
  );
  const allSuites = [...new Set(cells.map((c) => c.suite))].sort(byName);
  const needsLook = (suite: string) =>
    targets.some((t) => {
      const d = described.get(`${suite}\u0000${t}`);
      return d !== undefined && d.words.tone !== 'pass';
    });
  const suites = onlyProblems ? allSuites.filter(needsLook) : allSuites;
  const tally = tallyCells([...described.values()].map((d) => d.words));

  const cellView = (suite: string, target: string, layout: Layout) => {
    const entry = described.get(`${suite}\u0000${target}`);
    if (!entry) {
      return (
        <View
          key={target}
          style={layout === 'grid' ? [styles.gridCell, styles.absent] : [styles.rowCell, styles.absent]}
          accessibilityLabel={`${suite} on ${target}: not part of this run`}
        >
          {layout !== 'grid' ? (
            <SkText variant="mono" tone="inkSoft" style={styles.rowTarget}>
              {target}
            </SkText>
          ) : null}
          <SkText variant="caption">— not in this run</SkText>
        </View>
      );
    }
    // On a phone a passing check is one line: its details (worker, counts) are for the wide grid.
    const shown = layout === 'row' && entry.words.tone === 'pass' ? 'line' : layout;
    return <MatrixCellView key={target} cell={entry.cell} words={entry.words} layout={shown} />;
  };
  const suiteCard = (suite: string) => (
    <View key={suite} style={styles.card}>
      <SkText variant="mono" accessibilityRole="header">
        {suite}
      </SkText>
      {targets.map((t) => cellView(suite, t, 'row'))}
    </View>
  );

  // A definite width for the grid: in a horizontal scroller, flexible columns would otherwise size to their longest text.
  const gridWidth = Math.max(boxWidth, SUITE_COLUMN + targets.length * TARGET_COLUMN_MIN);
  const passedSuites = allSuites.filter((s) => !needsLook(s));
  const passedFoldWords = `${plural(passedSuites.length, 'suite')} passed on every library version: ${showPassed ? 'hide' : 'show'} ${passedSuites.length === 1 ? 'it' : 'them'}`;

  return (
    <View style={styles.box} onLayout={(e) => setBoxWidth(e.nativeEvent.layout.width)}>
      <SkText variant="caption" style={styles.summary} testID="matrix-summary">
        {`${plural(tally.total, 'check')} (${plural(allSuites.length, 'suite')} × ${plural(targets.length, 'library version')}): ${tallyWords(tally)}`}
      </SkText>
      {wide ? (
        <Pressable
          accessibilityRole="switch"
          accessibilityLabel="Show only suites that need a look"
          aria-checked={onlyProblems}
          onPress={() => setOnlyProblems((v) => !v)}
          {...spaceToggles(() => setOnlyProblems((v) => !v))}
          style={[styles.toggle, onlyProblems && styles.toggleOn]}
        >
          <CheckBoxMark on={onlyProblems} />
          <SkText variant="caption" tone="ink" style={onlyProblems && styles.toggleTextOn}>
            Only suites that need a look
          </SkText>
        </Pressable>
      ) : null}
      {wide && suites.length === 0 ? (
        <SkText variant="caption">Every suite passed on every library version.</SkText>
      ) : null}
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
                Suites in rows, library versions in columns
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
        <>
          {allSuites.filter(needsLook).map(suiteCard)}
          {passedSuites.length > 0 ? (
            <DisclosureToggle
              open={showPassed}
              onToggle={() => setShowPassed((v) => !v)}
              // The name holds the visible words (glyph aside), and the chevron says open or closed:
              // ↑ and ↓ are counts that went up or down (constants/glyphs.ts), not show and hide.
              accessibilityLabel={passedFoldWords}
              style={styles.passedToggle}
            >
              <SkText variant="label" tone="ink">
                {`${OUTCOME_GLYPH.pass} ${passedFoldWords}`}
              </SkText>
            </DisclosureToggle>
          ) : null}
          {showPassed ? passedSuites.map(suiteCard) : null}
        </>
      )}
    </View>
  );
}

type Layout = 'grid' | 'row' | 'line';

function MatrixCellView({ cell, words, layout }: { cell: RunMatrixCell; words: MatrixCellWords; layout: Layout }) {
  const tone = OUTCOME_TONE[words.tone];
  const frame = StyleSheet.flatten([
    layout === 'grid' ? styles.gridCell : layout === 'row' ? styles.rowCell : styles.lineCell,
    { backgroundColor: tone.soft, borderLeftColor: tone.edge },
  ]);
  const headline = <Text style={[styles.headline, { color: tone.ink }]}>{words.headline}</Text>;
  const linkWords = words.link ? (
    <SkText variant="smallLabel" tone="accent">
      {words.link.words}
    </SkText>
  ) : null;
  const target = (
    <SkText variant="mono" tone="inkSoft" style={layout === 'line' ? styles.rowTarget : null}>
      {cell.target}
    </SkText>
  );
  // A phone's row: the target, outcome and link on one line, the details as one paragraph of at
  // most three lines below (each on its own line, a failing check was ~140 px tall; all of it is
  // in the label for a screen reader). A grid cell is the same at its column's width: the outcome
  // and link on one line, the details one flowing paragraph whose parts stay their own words
  // (a line per detail made the demo's largest run 135 px a suite, 3,266 px for 27 suites).
  const content =
    layout === 'grid' ? (
      <View style={styles.cellWords}>
        <View style={styles.cellHead}>
          {headline}
          {linkWords}
        </View>
        {words.details.length > 0 ? (
          <SkText variant="caption">
            {words.details.map((line, i) => (
              <Fragment key={i}>
                {i > 0 ? ' · ' : null}
                <Text>{line}</Text>
              </Fragment>
            ))}
          </SkText>
        ) : null}
      </View>
    ) : layout === 'row' ? (
      <>
        <View style={styles.rowHead}>
          {target}
          {headline}
          {linkWords}
        </View>
        {words.details.length > 0 ? (
          <SkText variant="caption" numberOfLines={3}>
            {words.details.join(' · ')}
          </SkText>
        ) : null}
      </>
    ) : (
      <>
        {target}
        {headline}
      </>
    );
  if (!words.link) {
    return (
      <View style={frame} accessibilityLabel={words.label} testID={`cell-${cell.suite}-${cell.target}`}>
        {content}
      </View>
    );
  }
  return (
    <Link href={words.link.href} asChild>
      <Pressable accessibilityRole="link" style={frame} testID={`cell-${cell.suite}-${cell.target}`}>
        <ScreenReaderWords>{`${words.label}. ${words.link.said}. `}</ScreenReaderWords>
        {content}
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  summary: { lineHeight: 20 },
  toggle: { ...CHOICE_CHIP_STYLE, alignSelf: 'flex-start' },
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
    paddingVertical: theme.space(1),
    paddingHorizontal: theme.space(2),
    borderLeftWidth: 4,
    borderRadius: 4,
    justifyContent: 'center',
  },
  rowCell: {
    minHeight: theme.touch,
    justifyContent: 'center',
    gap: 2,
    paddingVertical: theme.space(2),
    paddingHorizontal: theme.space(3),
    borderLeftWidth: 4,
    borderRadius: 4,
  },
  cellHead: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'baseline',
    justifyContent: 'space-between',
    columnGap: theme.space(3),
  },
  rowHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: theme.space(3) },
  lineCell: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingVertical: theme.space(1),
    paddingHorizontal: theme.space(3),
    borderLeftWidth: 4,
    borderRadius: 4,
  },
  passedToggle: { backgroundColor: theme.color.panel },
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
