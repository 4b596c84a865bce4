import { useState } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { ConventionFingerprint } from '../../shared/convention-fingerprint';
import { ColumnHead } from '../ui/column-head';
import { DisclosureMark } from '../ui/disclosure-mark';
import { SkText } from '../ui/sk-text';
import { ConventionLabel } from './convention-label';
import { FingerprintDisagreementDetail } from './fingerprint-disagreement-detail';
import { CONVENTION_STYLES, type Behaviour } from './convention-styles';
import { formatComplexText } from '../../shared/format-complex-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';
import { CHOICE_CHIP_STYLE } from '../ui/choice-chip-style';
import { NOTE_BOX_STYLE } from '../ui/note-box-style';
import { plural } from '../../shared/plural';

type CutEntry = ConventionFingerprint['cuts'][number];
type Probe = CutEntry['probes'][number];

const BEHAVIOURS: Behaviour[] = ['signed-zero', 'counter-clockwise', 'neither', 'inconsistent'];

/** Where a probe sits, with both zero signs: "−0.5 ± 0i" on a cut along the real axis, "±0 + 2i" on one along the imaginary axis. */
function probePlace(at: Probe['at']): string {
  const text = formatComplexText(at);
  if (at.im === '0') return text.replace(/ \+ 0i$/, ' ± 0i');
  if (at.re === '0') return `±${text}`;
  return text;
}

/** What the places of one cut say, counted: "signed zero at 4 of 4 places". */
function evidenceLine(entry: CutEntry): string {
  const n = entry.probes.length;
  if (n === 0)
    return 'No place on this cut told the conventions apart (both Annex G values agreed wherever it was probed): this verdict rests on no evidence.';
  const counts = BEHAVIOURS.map((b) => [b, entry.probes.filter((p) => p.verdict === b).length] as const).filter(
    ([, c]) => c > 0,
  );
  if (counts.length === 1) return `${CONVENTION_STYLES[counts[0]![0]].word} at ${n} of ${plural(n, 'place')}`;
  return `${plural(n, 'place')}: ${counts.map(([b, c]) => `${c} ${CONVENTION_STYLES[b].word}`).join(', ')}`;
}

export interface FingerprintTableProps {
  fingerprint: ConventionFingerprint;
  /** Opens the cut map of one function (the label as the fingerprint names it). */
  onOpenCutMap?: (fn: string) => void;
}

/**
 * Which convention a target appears to follow on each cut of each function, in words and glyphs,
 * with the evidence behind each verdict one tap away: the places probed, the values with +0 and
 * with −0, and why a place voted as it did. Says how many places each verdict rests on and what
 * was not checked, because "signed zero" from four places is evidence there, not a certification.
 */
export function FingerprintTable({ fingerprint, onOpenCutMap }: FingerprintTableProps) {
  const wide = useWindowDimensions().width >= theme.wide;
  const places = fingerprint.cuts.reduce((sum, c) => sum + c.probes.length, 0);
  const byBehaviour = BEHAVIOURS.map(
    (b) => [b, fingerprint.cuts.filter((c) => c.behaviour === b).length] as const,
  ).filter(([, n]) => n > 0);
  const functions = new Set(fingerprint.cuts.map((c) => c.function)).size;

  return (
    <View style={styles.wrap}>
      <View style={styles.summary} testID="fingerprint-summary">
        <SkText variant="label">
          {plural(fingerprint.cuts.length, 'function–cut pair')} of {plural(functions, 'function')}
        </SkText>
        <View style={styles.chips}>
          {byBehaviour.map(([b, n]) => (
            <ConventionLabel key={b} behaviour={b} prefix={String(n)} />
          ))}
        </View>
      </View>

      <View style={styles.note} testID="fingerprint-scope">
        <SkText variant="strong">What this shows, and what it does not</SkText>
        <SkText variant="caption" style={styles.noteLine}>
          ✓ Checked: {plural(places, 'place')} that separate the conventions, over{' '}
          {plural(fingerprint.cuts.length, 'cut')}. At each, the target was called exactly on the cut with +0 and with
          −0 in the part across the cut, and 1e-9 off the cut on both sides; values were compared with the reference to
          a relative 1e-6.
        </SkText>
        <SkText variant="caption" style={styles.noteLine}>
          × Not checked: the rest of each cut, points further off it, accuracy, and any function the target lacks
          {fingerprint.missing.length ? ` (${fingerprint.missing.join(', ')})` : ''}. A verdict is evidence at the
          places listed under it — open them — not a certification.
        </SkText>
        <Text style={styles.noteSource}>{fingerprint.statement}</Text>
      </View>

      {wide ? (
        <View style={[styles.row, styles.headRow]}>
          <ColumnHead style={styles.fnCol}>Function</ColumnHead>
          <ColumnHead style={styles.cutCol}>Cut</ColumnHead>
          <ColumnHead style={styles.verdictCol}>Convention</ColumnHead>
          <ColumnHead style={styles.evidenceCol}>Evidence</ColumnHead>
        </View>
      ) : null}
      {fingerprint.cuts.map((entry) => (
        <CutRow key={`${entry.function} ${entry.cut}`} entry={entry} wide={wide} onOpenCutMap={onOpenCutMap} />
      ))}
    </View>
  );
}

function CutRow({
  entry,
  wide,
  onOpenCutMap,
}: {
  entry: CutEntry;
  wide: boolean;
  onOpenCutMap?: (fn: string) => void;
}) {
  const [open, setOpen] = useState(false);
  const [shown, setShown] = useState<string | null>(null);
  const name = `${entry.function} on ${entry.cut}`;
  const disagreement = entry.disagreements?.find((d) => d.with === shown) ?? null;
  return (
    <View style={wide ? styles.rowBox : styles.card} testID={`fingerprint-${entry.function}-${entry.cut}`}>
      <View style={wide ? styles.row : styles.cardBody}>
        <View style={wide ? styles.fnCol : styles.cardHead}>
          <SkText variant="monoBody">{entry.function}</SkText>
          {wide ? null : (
            <SkText variant="mono" tone="inkSoft">
              cut {entry.cut}
            </SkText>
          )}
        </View>
        {wide ? (
          <SkText variant="mono" tone="inkSoft" style={styles.cutCol}>
            {entry.cut}
          </SkText>
        ) : null}
        <View style={[wide ? styles.verdictCol : null, styles.verdictCell]}>
          <ConventionLabel behaviour={entry.behaviour} />
          {entry.alone !== entry.behaviour ? (
            <SkText variant="caption" style={styles.small}>
              On its own {CONVENTION_STYLES[entry.alone].glyph} {CONVENTION_STYLES[entry.alone].word}
              {entry.disagreesWith.length ? `; disagrees with ${entry.disagreesWith.join(', ')} on the same cut` : ''}
            </SkText>
          ) : null}
          {entry.disagreements?.length ? (
            // Each function it disagrees with leads to a point where the two part ways (older fingerprints carry none).
            <View style={styles.actions}>
              {entry.disagreements.map((d) => (
                <Pressable
                  key={d.with}
                  accessibilityRole="link"
                  accessibilityLabel={`Where ${entry.function} and ${d.with} part ways`}
                  aria-expanded={shown === d.with}
                  onPress={() => setShown(shown === d.with ? null : d.with)}
                  style={styles.linkButton}
                >
                  <DisclosureMark open={shown === d.with} ink={theme.color.accent} />
                  <SkText variant="smallLabel" tone="accent">
                    Where {entry.function} and {d.with} part ways
                  </SkText>
                </Pressable>
              ))}
            </View>
          ) : null}
          {disagreement ? <FingerprintDisagreementDetail cut={entry.cut} d={disagreement} /> : null}
        </View>
        <View style={[wide ? styles.evidenceCol : null, styles.evidenceCell]}>
          <SkText variant="caption" style={styles.small}>
            {evidenceLine(entry)}
          </SkText>
          <View style={styles.actions}>
            {entry.probes.length > 0 ? (
              <Pressable
                accessibilityRole="button"
                accessibilityLabel={`${open ? 'Hide' : 'Show'} ${plural(entry.probes.length, 'place')} probed for ${name}`}
                aria-expanded={open}
                onPress={() => setOpen(!open)}
                style={styles.linkButton}
              >
                <SkText variant="smallLabel" tone="accent">
                  {open ? 'Hide' : 'Show'} {plural(entry.probes.length, 'place')}
                </SkText>
              </Pressable>
            ) : null}
            {onOpenCutMap ? (
              <Pressable
                accessibilityRole="link"
                accessibilityLabel={`Cut map of ${entry.function}`}
                onPress={() => onOpenCutMap(entry.function)}
                style={styles.linkButton}
              >
                <SkText variant="smallLabel" tone="accent">
                  Cut map →
                </SkText>
              </Pressable>
            ) : null}
          </View>
        </View>
      </View>
      {open ? (
        <View style={styles.probes} accessibilityLabel={`Places probed for ${name}`}>
          <View style={wide ? styles.probeGrid : styles.probeList}>
            {entry.probes.map((p) => (
              <View key={`${p.at.re} ${p.at.im}`} style={[styles.probe, wide && styles.probeWide]}>
                <SkText variant="mono">z = {probePlace(p.at)}</SkText>
                <Text style={styles.mono}>with +0 → {formatComplexText(p.plusZero)}</Text>
                <Text style={styles.mono}>with −0 → {formatComplexText(p.minusZero)}</Text>
                <SkText variant="caption" style={styles.small}>
                  votes {CONVENTION_STYLES[p.verdict].glyph} {CONVENTION_STYLES[p.verdict].word}
                  {p.note ? `: ${p.note}` : ''}
                </SkText>
              </View>
            ))}
          </View>
          <SkText variant="caption" tone="ink" style={styles.meaning}>
            {CONVENTION_STYLES[entry.behaviour].glyph} {CONVENTION_STYLES[entry.behaviour].word}:{' '}
            {CONVENTION_STYLES[entry.behaviour].meaning}.
          </SkText>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: theme.space(2) },
  summary: { gap: theme.space(2), marginBottom: theme.space(2) },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  note: {
    ...NOTE_BOX_STYLE,
    gap: theme.space(2),
    marginBottom: theme.space(2),
  },
  noteLine: { lineHeight: 20 },
  noteSource: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkFaint, lineHeight: 18 },
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(3),
  },
  cardBody: { gap: theme.space(2) },
  cardHead: { flexDirection: 'row', alignItems: 'baseline', gap: theme.space(3), flexWrap: 'wrap' },
  rowBox: {
    backgroundColor: theme.color.panel,
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
    paddingHorizontal: theme.space(3),
  },
  row: { flexDirection: 'row', alignItems: 'center', gap: theme.space(3), paddingVertical: theme.space(2) },
  headRow: { paddingHorizontal: theme.space(3) },
  fnCol: { flex: 2 },
  cutCol: { flex: 2 },
  verdictCol: { flex: 4 },
  evidenceCol: { flex: 5 },
  verdictCell: { gap: theme.space(1) },
  evidenceCell: { gap: theme.space(1) },
  small: { lineHeight: 20 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  linkButton: CHOICE_CHIP_STYLE,
  probes: { gap: theme.space(2), paddingBottom: theme.space(3) },
  probeGrid: { flexDirection: 'row', flexWrap: 'wrap', columnGap: theme.space(4) },
  probeList: { gap: theme.space(2) },
  probeWide: { flexBasis: 260, flexGrow: 1, paddingBottom: theme.space(2) },
  probe: { borderTopWidth: 1, borderTopColor: theme.color.rule, paddingTop: theme.space(2), gap: 2 },
  mono: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  meaning: { lineHeight: 20 },
});
