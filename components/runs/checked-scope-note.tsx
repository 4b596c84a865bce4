import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { CheckedScope } from '../../shared/run-result';
import { SkText } from '../ui/sk-text';
import { NOTE_BOX_STYLE } from '../ui/note-box-style';
import { plural } from '../../shared/plural';
import { STOPPED_BY_ERROR } from '../../shared/stopped-by-error';

const CONVENTION_WORDS: Record<string, string> = {
  'signed-zero': 'signed zero (IEC 60559 / ISO C Annex G)',
  'counter-clockwise': 'counter-clockwise continuity',
};

export interface CheckedScopeNoteProps {
  /** What each finished check (one suite against one library version) covered (from the matrix, a result, a suite). */
  scopes: CheckedScope[];
  /** Checks of the run that checked nothing: still waiting or running, cancelled, or stopped by an error. */
  checksNotChecked?: number;
  /** Property checks of the run, when known. */
  properties?: { held: number; failed: number; notChecked: number };
  /** What the note is about: "matrix", "table", "result". */
  subject?: string;
}

const n = (x: number) => x.toLocaleString('en-GB');

/**
 * What a result does and does not show: the conventions, branches, paths, points and property
 * checks behind it, and that a green result is evidence for those points only — never a
 * certificate. Reusable wherever a green table or matrix could be read as more.
 */
export function CheckedScopeNote({
  scopes,
  checksNotChecked = 0,
  properties,
  subject = 'matrix',
}: CheckedScopeNoteProps) {
  const conventions = [...new Set(scopes.map((s) => s.convention))];
  // Each regular branch states its own point and cut layout; here they are counted, the matrix cells name them.
  const principal = scopes.filter((s) => /^principal/i.test(s.branch)).length;
  const regular = scopes.length - principal;
  const branches = [
    principal ? `principal branches (${plural(principal, 'check')})` : null,
    regular
      ? `regular branches fixed by a value at a point and continued along the paths (${plural(regular, 'check')})`
      : null,
  ].filter((b): b is string => b !== null);
  const tolerances = [...new Set(scopes.map((s) => s.tolerance))];
  const paths = scopes.reduce((sum, s) => sum + s.paths, 0);
  const points = scopes.reduce((sum, s) => sum + s.points, 0);
  const propertiesRun = properties ? properties.held + properties.failed : 0;
  const listedNotRun = scopes.filter((s) => s.properties.listed.length > 0 && !s.properties.run).length;

  const checked = [
    scopes.length === 0
      ? 'No check of a suite against a library version has finished, so nothing has been checked yet.'
      : `${plural(scopes.length, 'check')} of a suite against a library version, ${plural(paths, 'path')}, ${plural(points, 'point')} in all.`,
    conventions.length ? `Conventions: ${conventions.map((c) => CONVENTION_WORDS[c] ?? c).join('; ')}.` : null,
    branches.length ? `Branches: ${branches.join('; ')}.` : null,
    tolerances.length ? `Tolerances: ${tolerances.join('; ')}.` : null,
    properties
      ? `Property checks: ${plural(propertiesRun, 'law')} run on drawn points (${n(properties.held)} held, ${n(properties.failed)} failed)${properties.notChecked ? `, ${n(properties.notChecked)} not checked` : ''}.`
      : null,
  ].filter((line): line is string => line !== null);

  const notChecked = [
    'Any point off these paths, and any other convention, tolerance, library version or entry point.',
    checksNotChecked > 0
      ? `${plural(checksNotChecked, 'check')} of this run checked nothing (not finished, cancelled, or ${STOPPED_BY_ERROR}).`
      : null,
    listedNotRun > 0 ? `${plural(listedNotRun, 'check')} listed property laws that were not run.` : null,
    'A property that held is evidence at the points drawn, not a proof.',
  ].filter((line): line is string => line !== null);

  return (
    <View style={styles.box} testID="checked-scope-note">
      <SkText variant="strong">What this {subject} shows, and what it does not</SkText>
      <View style={styles.columns}>
        <View style={styles.column}>
          <SkText variant="smallLabel" tone="inkFaint" style={styles.head}>
            ✓ Checked
          </SkText>
          {checked.map((line) => (
            <SkText variant="caption" key={line} style={styles.line}>
              • {line}
            </SkText>
          ))}
        </View>
        <View style={styles.column}>
          <SkText variant="smallLabel" tone="inkFaint" style={styles.head}>
            × Not checked
          </SkText>
          {notChecked.map((line) => (
            <SkText variant="caption" key={line} style={styles.line}>
              • {line}
            </SkText>
          ))}
        </View>
      </View>
      <SkText variant="smallLabel" tone="ink" style={styles.verdict}>
        A green {subject} is evidence for these {plural(points, 'point')} under these conventions only — not a
        certificate that the library is right everywhere.
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    ...NOTE_BOX_STYLE,
    gap: theme.space(3),
  },
  columns: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(4) },
  column: { flexGrow: 1, flexBasis: 300, gap: theme.space(1) },
  head: { textTransform: 'uppercase', letterSpacing: 0.8 },
  line: { lineHeight: 20 },
  verdict: { lineHeight: 20 },
});
