import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { useSuiteTools } from '../../client/use-suite-tools';
import { theme } from '../../constants/theme';
import { PlanePicture } from '../pictures/plane-picture';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';

/**
 * A suite on the plane — its paths, cuts and branch points, computed by the same harness code
 * the runner uses — with a line saying what is drawn and what is not.
 */
export function SuitePreview({
  body,
  label,
  height = 320,
  testID,
}: {
  body: unknown;
  label: string;
  height?: number;
  testID?: string;
}) {
  const tools = useSuiteTools();
  const picture = useMemo(() => (tools.data ? tools.data.suitePicture(body) : null), [tools.data, body]);
  if (tools.isPending) return <QueryState state="loading" message="Loading the drawing tools…" />;
  if (tools.isError)
    return (
      <QueryState
        state="error"
        message={`The picture cannot be drawn: ${tools.error.message}`}
        onRetry={() => void tools.refetch()}
      />
    );
  if (!picture) return null;
  const lines = picture.paths.filter((p) => p.draw === 'line');
  const sets = picture.paths.filter((p) => p.draw === 'points');
  const pointCount = picture.paths.reduce((n, p) => n + p.points.length, 0);
  return (
    <View style={styles.box} testID={testID}>
      <PlanePicture
        label={`${label}: ${picture.paths.length} paths, ${picture.cuts.length} cuts, ${picture.branchPoints.length} branch points`}
        paths={lines.map((p) => ({ name: p.name, points: p.points }))}
        pointSets={sets.map((p) => ({ name: p.name, points: p.points }))}
        cuts={picture.cuts}
        branchPoints={picture.branchPoints}
        height={height}
        testID={testID ? `${testID}-plane` : undefined}
      />
      <SkText variant="caption" style={styles.summary} testID={testID ? `${testID}-summary` : undefined}>
        Drawn: {picture.paths.length} {picture.paths.length === 1 ? 'path' : 'paths'} ({pointCount} points),{' '}
        {picture.cuts.length} {picture.cuts.length === 1 ? 'cut' : 'cuts'}, {picture.branchPoints.length}{' '}
        {picture.branchPoints.length === 1 ? 'branch point' : 'branch points'}
        {picture.branchPoints.length > 0
          ? `: ${picture.branchPoints.map((p) => (Math.abs(p.im) < 1e-12 ? fmt(p.re) : `${fmt(p.re)}${p.im < 0 ? ' − ' : ' + '}${fmt(Math.abs(p.im))}i`)).join(', ')}`
          : ''}
        .
      </SkText>
      {picture.notes.map((note, i) => (
        <SkText variant="caption" tone="inkFaint" key={i} style={styles.note}>
          • {note}
        </SkText>
      ))}
    </View>
  );
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(6)) + 0);
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
  summary: { lineHeight: 20 },
  note: { lineHeight: 20 },
});
