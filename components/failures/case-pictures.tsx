import { StyleSheet, Text, View } from 'react-native';
import { useFailurePath } from '../../client/use-failure-path';
import { theme } from '../../constants/theme';
import type { FailurePathView } from '../../shared/failure-path-view';
import { SkText } from '../ui/sk-text';
import { DIAGNOSIS_STYLES, type DiagnosisTone } from './diagnosis-styles';
import { PathPlots } from '../pictures/path-plots';
import { PlanePicture, type PlanePictureProps } from '../pictures/plane-picture';
import { QueryState } from '../ui/query-state';

const CONTINUOUS = new Set(['circle', 'segment', 'polyline']);

/** The case on the plane (its path, the expected cuts and branch points, every point by outcome, this case ringed) and the plots along the path. */
export function CasePictures({ failureId }: { failureId: string }) {
  const path = useFailurePath(failureId);
  if (path.isPending) return <QueryState state="loading" />;
  if (path.isError)
    return (
      <QueryState
        state="error"
        message={`The path could not be drawn: ${path.error.message}`}
        onRetry={() => void path.refetch()}
      />
    );
  const v = path.data;
  if (v.points.length === 0) return <QueryState state="empty" message="This path has no points to draw." />;
  return (
    <View style={styles.root}>
      <PlanePicture label={planeWords(v)} height={340} {...planeProps(v)} testID="case-plane" />
      <DiagnosisTally view={v} />
      {v.cutsNote ? (
        <SkText variant="caption" style={styles.note}>
          {v.cutsNote}
        </SkText>
      ) : null}
      <SkText variant="caption" style={styles.note}>
        {v.note}
      </SkText>
      <PathPlots view={v} />
    </View>
  );
}

function planeProps(v: FailurePathView) {
  const zs = v.points.filter((p) => p.z !== null);
  const marks: NonNullable<PlanePictureProps['marks']> = zs.map((p) => {
    if (p.outcome !== 'fail') return { at: p.z!, tone: p.outcome };
    const style = DIAGNOSIS_STYLES[p.diagnosis ?? 'unexplained'];
    return { at: p.z!, tone: p.outcome, kind: { word: style.word, glyph: style.glyph, color: style.color } };
  });
  const focus = v.points.find((p) => p.index === v.focusIndex);
  if (focus?.z) marks.push({ at: focus.z, tone: 'focus' });
  // A straddle's places along a cut can lie a million apart while its offsets are 1e-3 and less:
  // the whole path would be one dot per place, so the picture shows this case's place across the cut.
  const near = v.path.kind === 'straddle' && focus ? zs.filter((p) => p.t === focus.t).map((p) => p.z!) : null;
  return {
    fitTo: near && near.length > 1 ? near : undefined,
    paths: CONTINUOUS.has(v.path.kind) ? [{ name: v.path.name, points: zs.map((p) => p.z!) }] : [],
    cuts: v.cuts,
    branchPoints: v.branchPoints,
    marks,
  };
}

function planeWords(v: FailurePathView): string {
  const failed = v.points.filter((p) => p.outcome !== 'pass').length;
  const near = v.path.kind === 'straddle' ? ', shown around this case’s place along the cut' : '';
  return `The complex plane with the path ${v.path.name} (${v.path.kind}, ${v.points.length} points${near}), ${v.cuts.length} expected cut${v.cuts.length === 1 ? '' : 's'} and ${v.branchPoints.length} branch point${v.branchPoints.length === 1 ? '' : 's'}; ${failed} point${failed === 1 ? '' : 's'} did not pass; this case is ringed.`;
}

/** The failing points of the path by diagnosis, each with its glyph and word. */
function DiagnosisTally({ view }: { view: FailurePathView }) {
  const tally = new Map<DiagnosisTone, number>();
  for (const p of view.points) {
    if (p.outcome === 'pass') continue;
    const tone: DiagnosisTone =
      p.diagnosis ?? (p.outcome === 'skipped' ? 'skipped' : p.outcome === 'error' ? 'error' : 'unexplained');
    tally.set(tone, (tally.get(tone) ?? 0) + 1);
  }
  const passed = view.points.filter((p) => p.outcome === 'pass').length;
  return (
    <View style={styles.tally}>
      <SkText variant="smallLabel" tone="ink">
        <Text style={{ color: theme.color.accent }}>✓ </Text>
        {passed} passed
      </SkText>
      {[...tally].map(([tone, n]) => (
        <SkText variant="smallLabel" tone="ink" key={tone}>
          <Text style={{ color: DIAGNOSIS_STYLES[tone].color, fontFamily: theme.font.bold }}>
            {DIAGNOSIS_STYLES[tone].glyph}{' '}
          </Text>
          {n} {DIAGNOSIS_STYLES[tone].word}
        </SkText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(3) },
  note: { lineHeight: 19 },
  tally: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(4) },
});
