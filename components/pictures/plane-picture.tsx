import { useState } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Polyline, Rect, Text as SvgText } from 'react-native-svg';
import { theme } from '../../constants/theme';
import { fitPlaneView, type PlaneView } from './fit-plane-view';
import { LegendEntry } from './legend-entry';
import { MARK_STYLES, type MarkTone } from './mark-styles';

export interface PlanePoint {
  re: number;
  im: number;
}

export interface PlanePictureProps {
  /** What the picture shows, in words: screen readers get this instead of the drawing. */
  label: string;
  /** Sampled paths, drawn as lines in the order given, with an arrow for the direction of travel. */
  paths?: { name: string; points: PlanePoint[] }[];
  /** Separate sample points (a straddle's points on both sides of a cut), drawn as small hollow dots, not joined. */
  pointSets?: { name: string; points: PlanePoint[] }[];
  /** Expected cuts: polylines, the last segment continued to the edge when `toInfinity`. */
  cuts?: { points: PlanePoint[]; toInfinity: boolean }[];
  /**
   * Lines found by sampling (where a target's function is really discontinuous), drawn thin
   * through their points with a marker at each: a dot, or a cross for what should not be there.
   * The legend names each distinct `name`.
   */
  lines?: { name: string; points: PlanePoint[]; marker: 'dot' | 'cross' }[];
  /** Branch points, drawn as rings. */
  branchPoints?: PlanePoint[];
  /**
   * Evaluated points, each with a tone that has its own shape as well as its own colour.
   * Optionally a finer `kind` (a diagnosis): its own colour and a legend entry with its word
   * and glyph, so the colour is never the only sign of it.
   */
  marks?: { at: PlanePoint; tone: MarkTone; kind?: { word: string; glyph: string; color: string } }[];
  /** The box to show; fitted to everything drawn when absent. */
  view?: PlaneView;
  /** Height in px; the width follows the container. */
  height?: number;
  testID?: string;
}

const PAD = 28;

/**
 * The complex plane with paths, cuts, branch points and evaluated points. Equal scale on both
 * axes, so angles and circles look like what they are. Each mark tone has a distinct shape and
 * the legend names it, so colour never carries the meaning alone.
 */
export function PlanePicture({
  label,
  paths = [],
  pointSets = [],
  cuts = [],
  lines = [],
  branchPoints = [],
  marks = [],
  view,
  height = 320,
  testID,
}: PlanePictureProps) {
  const [width, setWidth] = useState(0);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));
  const box =
    view ??
    fitPlaneView([
      ...paths.flatMap((p) => p.points),
      ...pointSets.flatMap((p) => p.points),
      ...cuts.flatMap((c) => c.points),
      ...branchPoints,
      ...marks.map((m) => m.at),
    ]);
  const innerW = Math.max(1, width - 2 * PAD);
  const innerH = Math.max(1, height - 2 * PAD);
  // Equal scale: the box is widened along one axis to the picture's aspect ratio.
  const scale = Math.min(innerW / (box.maxRe - box.minRe), innerH / (box.maxIm - box.minIm));
  const midRe = (box.minRe + box.maxRe) / 2;
  const midIm = (box.minIm + box.maxIm) / 2;
  const x = (re: number) => width / 2 + (re - midRe) * scale;
  const y = (im: number) => height / 2 - (im - midIm) * scale;
  const visible = (p: PlanePoint) => Number.isFinite(p.re) && Number.isFinite(p.im);
  const far = (2 * (width + height)) / scale;
  const legendOf = (m: (typeof marks)[number]) =>
    m.kind ? `${m.kind.glyph} ${MARK_STYLES[m.tone].word}: ${m.kind.word}` : MARK_STYLES[m.tone].word;
  const legendMarks = [...new Map(marks.map((m) => [legendOf(m), m])).values()];

  return (
    <View style={styles.frame} onLayout={onLayout} testID={testID}>
      <View accessible accessibilityRole="image" accessibilityLabel={label} style={{ height }}>
        {width > 0 ? (
          <Svg width={width} height={height}>
            <Rect x={0} y={0} width={width} height={height} fill={theme.color.panel} />
            <Line x1={0} x2={width} y1={y(0)} y2={y(0)} stroke={theme.color.rule} strokeWidth={1} />
            <Line x1={x(0)} x2={x(0)} y1={0} y2={height} stroke={theme.color.rule} strokeWidth={1} />
            <SvgText x={width - 6} y={y(0) - 6} fontSize={11} fill={theme.color.inkFaint} textAnchor="end">
              Re
            </SvgText>
            <SvgText x={x(0) + 6} y={12} fontSize={11} fill={theme.color.inkFaint}>
              Im
            </SvgText>
            {cuts.map((cut, i) => {
              const pts = cut.points.filter(visible);
              if (pts.length < 2) return null;
              const ends = [...pts];
              if (cut.toInfinity) {
                const a = pts[pts.length - 2]!;
                const b = pts[pts.length - 1]!;
                const len = Math.hypot(b.re - a.re, b.im - a.im) || 1;
                ends.push({ re: b.re + ((b.re - a.re) / len) * far, im: b.im + ((b.im - a.im) / len) * far });
              }
              return (
                <Polyline
                  key={`cut-${i}`}
                  points={ends.map((p) => `${x(p.re)},${y(p.im)}`).join(' ')}
                  fill="none"
                  stroke={theme.color.danger}
                  strokeWidth={3}
                  strokeDasharray="8 5"
                />
              );
            })}
            {lines.map((line, i) => {
              const pts = line.points.filter(visible);
              const color = line.marker === 'cross' ? theme.color.danger : theme.color.ink;
              return (
                <G key={`line-${i}`}>
                  {/* Dots sit on a cut drawn beneath them: no joining line, so the cut's dashes stay visible between them. */}
                  {line.marker === 'cross' && pts.length > 1 ? (
                    <Polyline
                      points={pts.map((p) => `${x(p.re)},${y(p.im)}`).join(' ')}
                      fill="none"
                      stroke={color}
                      strokeWidth={1.5}
                    />
                  ) : null}
                  {pts.map((p, k) => (
                    <LineMarker key={k} cx={x(p.re)} cy={y(p.im)} marker={line.marker} />
                  ))}
                </G>
              );
            })}
            {paths.map((path, i) => {
              const pts = path.points.filter(visible);
              if (pts.length < 2) return null;
              const mid = Math.floor(pts.length / 2);
              const a = pts[Math.max(0, mid - 1)]!;
              const b = pts[mid]!;
              const angle = (Math.atan2(-(b.im - a.im), b.re - a.re) * 180) / Math.PI;
              return (
                <G key={`path-${i}`}>
                  <Polyline
                    points={pts.map((p) => `${x(p.re)},${y(p.im)}`).join(' ')}
                    fill="none"
                    stroke={theme.color.ink}
                    strokeWidth={1.5}
                  />
                  <Path
                    d="M -6 -5 L 4 0 L -6 5 Z"
                    fill={theme.color.ink}
                    transform={`translate(${x(b.re)} ${y(b.im)}) rotate(${angle})`}
                  />
                </G>
              );
            })}
            {pointSets.map((set, i) => (
              <G key={`set-${i}`}>
                {set.points.filter(visible).map((p, k) => (
                  <PointDot key={k} cx={x(p.re)} cy={y(p.im)} />
                ))}
              </G>
            ))}
            {marks
              .filter((m) => visible(m.at))
              .map((m, i) => (
                <MarkShape key={`mark-${i}`} cx={x(m.at.re)} cy={y(m.at.im)} tone={m.tone} color={m.kind?.color} />
              ))}
            {branchPoints.filter(visible).map((p, i) => (
              <BranchPointShape key={`bp-${i}`} cx={x(p.re)} cy={y(p.im)} />
            ))}
          </Svg>
        ) : null}
      </View>
      <View style={styles.legend}>
        {cuts.length ? (
          <LegendEntry text="expected cut">
            <Line x1={1} x2={17} y1={8} y2={8} stroke={theme.color.danger} strokeWidth={3} strokeDasharray="5 3" />
          </LegendEntry>
        ) : null}
        {[...new Map(lines.map((l) => [`${l.marker} ${l.name}`, l])).values()].map((l) => (
          <LegendEntry key={`${l.marker} ${l.name}`} text={l.name}>
            {l.marker === 'cross' ? (
              <Line x1={1} x2={17} y1={8} y2={8} stroke={theme.color.danger} strokeWidth={1.5} />
            ) : null}
            <LineMarker cx={4} cy={8} marker={l.marker} />
            <LineMarker cx={14} cy={8} marker={l.marker} />
          </LegendEntry>
        ))}
        {branchPoints.length ? (
          <LegendEntry text="branch point">
            <BranchPointShape cx={9} cy={8} />
          </LegendEntry>
        ) : null}
        {paths.length ? (
          <LegendEntry text={paths.length === 1 ? `path ${paths[0]!.name}` : `${paths.length} paths`}>
            <Line x1={1} x2={17} y1={8} y2={8} stroke={theme.color.ink} strokeWidth={1.5} />
          </LegendEntry>
        ) : null}
        {pointSets.length ? (
          <LegendEntry
            text={
              pointSets.length === 1 ? `points of ${pointSets[0]!.name}` : `points of ${pointSets.length} straddles`
            }
          >
            <PointDot cx={9} cy={8} />
          </LegendEntry>
        ) : null}
        {legendMarks.map((m) => (
          <LegendEntry key={legendOf(m)} text={legendOf(m)}>
            <MarkShape cx={9} cy={8} tone={m.tone} color={m.kind?.color} inLegend />
          </LegendEntry>
        ))}
        <Text style={styles.scale}>
          Re {fmt(midRe - innerW / 2 / scale)} … {fmt(midRe + innerW / 2 / scale)}, Im {fmt(midIm - innerH / 2 / scale)}{' '}
          … {fmt(midIm + innerH / 2 / scale)}
        </Text>
      </View>
    </View>
  );
}

/** `inLegend` draws the ring smaller, so it fits the legend's 18 × 16 swatch. */
function MarkShape({
  cx,
  cy,
  tone,
  color = MARK_STYLES[tone].color,
  inLegend = false,
}: {
  cx: number;
  cy: number;
  tone: MarkTone;
  color?: string;
  inLegend?: boolean;
}) {
  switch (tone) {
    case 'pass':
      return <Circle cx={cx} cy={cy} r={3} fill={color} />;
    case 'fail':
      return (
        <Path
          d={`M ${cx - 5} ${cy - 5} L ${cx + 5} ${cy + 5} M ${cx - 5} ${cy + 5} L ${cx + 5} ${cy - 5}`}
          stroke={color}
          strokeWidth={2.5}
        />
      );
    case 'error':
      return <Path d={`M ${cx} ${cy - 6} L ${cx + 6} ${cy + 5} L ${cx - 6} ${cy + 5} Z`} fill={color} />;
    case 'skipped':
      return <Rect x={cx - 4} y={cy - 4} width={8} height={8} fill="none" stroke={color} strokeWidth={1.5} />;
    case 'focus':
      return (
        <Circle cx={cx} cy={cy} r={inLegend ? 5.5 : 10} fill="none" stroke={color} strokeWidth={inLegend ? 2 : 3} />
      );
  }
}

function PointDot({ cx, cy }: { cx: number; cy: number }) {
  return <Circle cx={cx} cy={cy} r={2.5} fill={theme.color.panel} stroke={theme.color.ink} strokeWidth={1.2} />;
}

function LineMarker({ cx, cy, marker }: { cx: number; cy: number; marker: 'dot' | 'cross' }) {
  if (marker === 'dot') return <Circle cx={cx} cy={cy} r={1.75} fill={theme.color.ink} />;
  return (
    <Path
      d={`M ${cx - 4} ${cy - 4} L ${cx + 4} ${cy + 4} M ${cx - 4} ${cy + 4} L ${cx + 4} ${cy - 4}`}
      stroke={theme.color.danger}
      strokeWidth={2}
    />
  );
}

function BranchPointShape({ cx, cy }: { cx: number; cy: number }) {
  return (
    <G>
      <Circle cx={cx} cy={cy} r={6} fill={theme.color.panel} stroke={theme.color.focus} strokeWidth={2.5} />
      <Circle cx={cx} cy={cy} r={1.5} fill={theme.color.focus} />
    </G>
  );
}

function fmt(v: number): string {
  return Math.abs(v) >= 1000 || (Math.abs(v) < 0.01 && v !== 0) ? v.toExponential(1) : String(Number(v.toFixed(2)));
}

const styles = StyleSheet.create({
  frame: {
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    overflow: 'hidden',
    backgroundColor: theme.color.panel,
  },
  legend: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: theme.space(3),
    padding: theme.space(3),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
  },
  scale: { fontFamily: theme.font.mono, fontSize: 11, color: theme.color.inkFaint, width: '100%' },
});
