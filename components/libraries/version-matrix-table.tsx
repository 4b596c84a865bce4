import { useState } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { VersionMatrix } from '../../shared/version-matrix';
import { FormulaText } from '../ui/formula-text';
import { SkText } from '../ui/sk-text';
import { formatComplexText } from '../../shared/format-complex-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';
import { NOTE_BOX_STYLE } from '../ui/note-box-style';
import { DIAGNOSIS_KIND_NAMES } from '../../shared/diagnosis-kind-names';
import { plural } from '../../shared/plural';

type SuiteEntry = VersionMatrix['suites'][number];
type Change = SuiteEntry['changes'][number];
type Side = Change['steps'][number]['before'];

/** Changes listed before "show all": a suite whose every point moved lists hundreds. */
const FIRST = 20;

/** A pair's status at one version in a glyph and words, so the cell reads without colour. */
function statusWords(s: SuiteEntry['statusByVersion'][number]): { glyph: string; text: string; bad: boolean } {
  if (s.status === 'pass') return { glyph: '✓', text: `pass (${s.pass})`, bad: false };
  if (s.status === 'fail') return { glyph: '❌', text: `${s.fail} failed`, bad: true };
  return { glyph: '◊', text: s.status, bad: true };
}

function outcomeWords(o: Side['outcome']): string {
  switch (o.kind) {
    case 'pass':
      return '✓ pass';
    case 'fail':
      return `× ${DIAGNOSIS_KIND_NAMES[o.diagnosis.kind].name}`;
    case 'error':
      return `! error: ${o.message}`;
    case 'skipped':
      return `− ${o.reason}`;
  }
}

export interface VersionMatrixTableProps {
  library: string;
  versions: string[];
  suites: SuiteEntry[];
  /** Suites asked for whose rows have not arrived yet. */
  pending?: number;
}

/**
 * The same suites over every installed version of one library: each suite's status at each
 * version and how many of its points changed value there (bit for bit, zero signs included),
 * with the changed points one tap away. A matrix without changes says the values at these
 * points stayed the same, nothing more; the note says so.
 */
export function VersionMatrixTable({ library, versions, suites, pending = 0 }: VersionMatrixTableProps) {
  const wide = useWindowDimensions().width >= theme.wide;
  const changed = suites.filter((s) => s.changes.length > 0);
  const points = suites.reduce((sum, s) => sum + s.changes.length, 0);

  return (
    <View style={styles.wrap}>
      <SkText variant="label" style={styles.summary} testID="matrix-summary">
        {plural(suites.length, 'suite')} over {plural(versions.length, 'version')} of {library}:{' '}
        {changed.length === 0
          ? 'no value changed between consecutive versions.'
          : `${plural(points, 'point')} in ${plural(changed.length, 'suite')} changed value somewhere.`}
        {pending > 0 ? ` ${plural(pending, 'more suite')} still being compared…` : ''}
      </SkText>
      <View style={styles.note} testID="matrix-scope">
        <SkText variant="strong">What this shows, and what it does not</SkText>
        <SkText variant="caption" style={styles.noteLine}>
          ✓ Compared: each suite&apos;s newest approved version run on {versions.join(', ')}; every point&apos;s value
          compared bit for bit (zero signs included) with the previous version&apos;s. ∆ counts the points whose value
          changed at that version.
        </SkText>
        <SkText variant="caption" style={styles.noteLine}>
          × Not compared: versions not installed here, points off the suites&apos; paths, and other settings of the
          library. &quot;No change&quot; means the same values at these points, not the same library.
        </SkText>
      </View>

      {wide ? (
        <View style={[styles.row, styles.headRow]}>
          <SkText variant="smallLabel" tone="inkFaint" style={[styles.head, styles.suiteCol]}>
            Suite
          </SkText>
          {versions.map((v) => (
            <SkText variant="smallLabel" tone="inkFaint" key={v} style={[styles.head, styles.versionCol]}>
              {v}
            </SkText>
          ))}
        </View>
      ) : null}
      {suites.map((suite) => (
        <SuiteRow key={suite.id} suite={suite} versions={versions} wide={wide} />
      ))}
    </View>
  );
}

function SuiteRow({ suite, versions, wide }: { suite: SuiteEntry; versions: string[]; wide: boolean }) {
  const [open, setOpen] = useState(false);
  const [all, setAll] = useState(false);
  const changedAt = (v: string) =>
    suite.changes.reduce((n, c) => n + c.steps.filter((s) => s.after.version === v).length, 0);
  const cells = versions.map((v) => {
    const status = suite.statusByVersion.find((s) => s.version === v);
    const words = status ? statusWords(status) : { glyph: '−', text: 'not run', bad: false };
    const delta = changedAt(v);
    return { v, words, delta };
  });
  const shown = all ? suite.changes : suite.changes.slice(0, FIRST);

  return (
    <View style={wide ? styles.rowBox : styles.card} testID={`matrix-${suite.id}`}>
      <View style={wide ? styles.row : styles.cardBody}>
        <View style={wide ? styles.suiteCol : null}>
          <SkText variant="mono">
            {suite.id} <Text style={styles.faint}>v{suite.version}</Text>
          </SkText>
          <FormulaText text={suite.subject} typed style={styles.subject} />
          {suite.entry ? <Text style={styles.subject}>values built through the {suite.entry} entry</Text> : null}
        </View>
        <View style={wide ? styles.cellsWide : styles.cellsPhone}>
          {cells.map(({ v, words, delta }) => (
            <View
              key={v}
              style={[wide ? styles.versionCol : styles.chip, words.bad && styles.cellBad]}
              accessibilityLabel={`${suite.id} at ${v}: ${words.text}${delta ? `, ${delta} changed` : ''}`}
            >
              {wide ? null : <Text style={styles.chipVersion}>{v}</Text>}
              <SkText variant="smallLabel" tone="accent" style={words.bad && styles.badText}>
                {words.glyph} {words.text}
              </SkText>
              {delta ? <Text style={styles.delta}>∆ {delta} changed</Text> : null}
            </View>
          ))}
        </View>
      </View>
      {suite.changes.length > 0 ? (
        <Pressable
          accessibilityRole="button"
          accessibilityLabel={`${open ? 'Hide' : 'Show'} ${plural(suite.changes.length, 'changed point')} of ${suite.id}`}
          aria-expanded={open}
          onPress={() => setOpen(!open)}
          style={styles.linkButton}
        >
          <SkText variant="smallLabel" tone="accent">
            {open ? 'Hide' : 'Show'} {plural(suite.changes.length, 'changed point')}
          </SkText>
        </Pressable>
      ) : (
        <Text style={styles.faint}>No point of this suite changed value between these versions.</Text>
      )}
      {open ? (
        <View style={styles.changes}>
          {shown.map((c) => (
            <View key={`${c.path} ${c.index}`} style={styles.change}>
              <Text style={styles.changeHead}>
                {c.path} · point {c.index}
                {c.label ? ` (${c.label})` : ''} · z = {formatComplexText(c.z)}
              </Text>
              <Text style={styles.faint}>first changed in {c.firstChangedIn}</Text>
              {c.steps.map((s) => (
                <View key={s.after.version} style={styles.stepBox}>
                  <Text style={styles.step}>
                    {s.before.version}: {formatComplexText(s.before.value)} ({outcomeWords(s.before.outcome)})
                  </Text>
                  <Text style={styles.step}>
                    → {s.after.version}: {formatComplexText(s.after.value)} ({outcomeWords(s.after.outcome)})
                  </Text>
                </View>
              ))}
            </View>
          ))}
          {suite.changes.length > FIRST && !all ? (
            <Pressable
              accessibilityRole="button"
              accessibilityLabel={`Show all ${suite.changes.length} changed points of ${suite.id}`}
              onPress={() => setAll(true)}
              style={styles.linkButton}
            >
              <SkText variant="smallLabel" tone="accent">
                Show all {suite.changes.length}
              </SkText>
            </Pressable>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: theme.space(2) },
  summary: { lineHeight: 24 },
  note: {
    ...NOTE_BOX_STYLE,
    gap: theme.space(2),
    marginBottom: theme.space(2),
  },
  noteLine: { lineHeight: 20 },
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(3),
  },
  cardBody: { gap: theme.space(3) },
  rowBox: {
    backgroundColor: theme.color.panel,
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
    paddingHorizontal: theme.space(3),
    paddingBottom: theme.space(2),
    gap: theme.space(1),
  },
  row: { flexDirection: 'row', alignItems: 'center', gap: theme.space(2), paddingVertical: theme.space(2) },
  // On the web the version headings stay in view while a long matrix scrolls under them (react-native-web passes "sticky" through).
  headRow: {
    paddingHorizontal: theme.space(3),
    position: 'sticky' as 'relative',
    top: 0,
    zIndex: 1,
    backgroundColor: theme.color.paper,
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  head: { letterSpacing: 0.5 },
  suiteCol: { flex: 3, minWidth: 0 },
  versionCol: {
    flex: 1,
    minWidth: 0,
    paddingVertical: 2,
    paddingHorizontal: theme.space(1),
    borderRadius: theme.radius,
  },
  cellsWide: { flex: 7, flexDirection: 'row', gap: theme.space(2) },
  cellsPhone: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: {
    minWidth: 96,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    paddingHorizontal: theme.space(2),
    paddingVertical: theme.space(1),
  },
  cellBad: { backgroundColor: theme.color.dangerSoft },
  chipVersion: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkFaint },
  badText: { color: theme.color.danger },
  delta: { fontFamily: theme.font.medium, fontSize: 12, color: theme.color.ink },
  subject: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  faint: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkFaint },
  linkButton: {
    minHeight: 44,
    justifyContent: 'center',
    alignSelf: 'flex-start',
    paddingHorizontal: theme.space(3),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.rule,
  },
  changes: { gap: theme.space(2), paddingBottom: theme.space(2) },
  change: { borderTopWidth: 1, borderTopColor: theme.color.rule, paddingTop: theme.space(2), gap: 2 },
  changeHead: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.ink },
  stepBox: { gap: 0 },
  step: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft, lineHeight: 18 },
});
