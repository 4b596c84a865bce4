import { useEffect, useRef, useState } from 'react';
import { StyleSheet, Text, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Polyline, Rect } from 'react-native-svg';
import { theme } from '../../constants/theme';
import { SmallButton } from '../ui/small-button';
import { formulaSpeech } from '../ui/formula-speech';
import { ChartText } from './chart-text';
import { decadeText } from './decade-text';
import { describePlaneScale } from './describe-plane-scale';
import { fitPlaneView, type PlaneView } from './fit-plane-view';
import { LegendEntry } from './legend-entry';
import { MARK_STYLES, type MarkTone } from './mark-styles';
import { zoomPlaneView } from './zoom-plane-view';

export interface PlanePoint {
  re: number;
  im: number;
}

export interface PlanePictureProps {
  /** What the picture shows, in words: screen readers get this instead of the drawing. */
  label: string;
  /** Sampled paths, drawn as lines in the order given, with an arrow for the direction of travel. */
  paths?: { name: string; points: PlanePoint[] }[];
  /** Separate sample points (a straddle's points on both sides of a cut, a list of points), drawn as small hollow dots, not joined. */
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
  /** A fixed box of the plane to show (a cut map's sampled box); fitted by `fitPlaneView` when absent. */
  view?: PlaneView;
  /** The points the fit must keep in view; every path, point set and mark when absent. */
  fitTo?: PlanePoint[];
  /** Height in px; the width follows the container. */
  height?: number;
  testID?: string;
}

const PAD = 28;
/**
 * Each press zooms by this factor. In by at most 2^30 (past it a double's 52 bits show their
 * grain), out by at most 2^10 (a ray is drawn 1e4 box units long: fit-plane-view.ts).
 */
const ZOOM_STEP = 2;
const ZOOM_IN_LIMIT = 30;
const ZOOM_OUT_LIMIT = 10;

/**
 * The complex plane with paths, cuts, branch points and evaluated points, fitted to the
 * picture's own points (fit-plane-view.ts: linear, or a log scale of distance from the nearest
 * branch point or cut where scales differ by orders of magnitude, said under the picture and on
 * it). Equal scale on both axes, so angles and circles look like what they are. Zoom in, out and
 * back with the buttons, or with +, − and 0 while the picture has the keyboard focus. Each mark
 * tone has a distinct shape and the legend names it, so colour never carries the meaning alone.
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
  fitTo,
  height = 320,
  testID,
}: PlanePictureProps) {
  const [width, setWidth] = useState(0);
  const [zoomPower, setZoomPower] = useState(0);
  const picture = useRef<View>(null);
  const onLayout = (e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width));
  const zoomBy = (step: number) =>
    setZoomPower((z) => (step === 0 ? 0 : Math.max(-ZOOM_OUT_LIMIT, Math.min(ZOOM_IN_LIMIT, z + step))));
  // Keys on the web only: a focused picture takes +, − and 0 (React Native's View has no key events elsewhere).
  useEffect(() => {
    const node = picture.current as unknown as {
      addEventListener?: HTMLElement['addEventListener'];
      removeEventListener?: HTMLElement['removeEventListener'];
    } | null;
    if (!node?.addEventListener) return;
    const onKey = (e: KeyboardEvent) => {
      const step =
        e.key === '+' || e.key === '=' ? 1 : e.key === '-' || e.key === '\u2212' ? -1 : e.key === '0' ? 0 : null;
      if (step === null) return;
      e.preventDefault();
      zoomBy(step);
    };
    node.addEventListener('keydown', onKey);
    return () => node.removeEventListener?.('keydown', onKey);
  }, []);

  const focus = marks.find((m) => m.tone === 'focus')?.at;
  const fit = fitPlaneView({
    points: fitTo ?? [
      ...paths.flatMap((p) => p.points),
      ...pointSets.flatMap((p) => p.points),
      ...marks.map((m) => m.at),
    ],
    branchPoints,
    cuts,
    focus,
    box: view,
  });
  const zoom = ZOOM_STEP ** zoomPower;
  const box = zoomPlaneView(fit.box, zoom);
  const innerW = Math.max(1, width - 2 * PAD);
  const innerH = Math.max(1, height - 2 * PAD);
  // Box units per pixel, by division: a box 2e-310 wide has 1e312 px per unit, which is no double.
  const unit = Math.max((box.maxRe - box.minRe) / innerW, (box.maxIm - box.minIm) / innerH);
  const x = (v: PlanePoint) => width / 2 + (v.re - (box.minRe + box.maxRe) / 2) / unit;
  const y = (v: PlanePoint) => height / 2 - (v.im - (box.minIm + box.maxIm) / 2) / unit;
  const at = (p: PlanePoint) => {
    const v = fit.project(p);
    return { cx: x(v), cy: y(v) };
  };
  const polyline = (pts: PlanePoint[]) =>
    pts
      .map(fit.project)
      .map((v) => `${x(v)},${y(v)}`)
      .join(' ');
  const visible = (p: PlanePoint) => Number.isFinite(p.re) && Number.isFinite(p.im);
  const legendOf = (m: (typeof marks)[number]) =>
    m.kind ? `${m.kind.glyph} ${MARK_STYLES[m.tone].word}: ${m.kind.word}` : MARK_STYLES[m.tone].word;
  const legendMarks = [...new Map(marks.map((m) => [legendOf(m), m])).values()];
  const scaleWords = describePlaneScale(fit, box);
  const log = fit.scale.kind === 'log' ? fit.scale : null;
  const origin = fit.project({ re: 0, im: 0 });
  const zoomWords = `zoom ${zoom >= 1 ? `${zoom}×` : `1/${1 / zoom}×`}`;

  return (
    <View style={styles.frame} onLayout={onLayout} testID={testID}>
      <View
        ref={picture}
        accessible
        focusable
        accessibilityRole="image"
        accessibilityLabel={formulaSpeech(
          `${label} Scale: ${scaleWords}; ${zoomWords}. Press + or − to zoom, 0 to reset.`,
        )}
        style={{ height }}
      >
        {width > 0 ? (
          <Svg width={width} height={height}>
            <Rect x={0} y={0} width={width} height={height} fill={theme.color.panel} />
            {log ? (
              <G>
                <Line
                  x1={0}
                  x2={width}
                  y1={y({ re: 0, im: 0 })}
                  y2={y({ re: 0, im: 0 })}
                  stroke={theme.color.rule}
                  strokeWidth={1}
                />
                <Line
                  x1={x({ re: 0, im: 0 })}
                  x2={x({ re: 0, im: 0 })}
                  y1={0}
                  y2={height}
                  stroke={theme.color.rule}
                  strokeWidth={1}
                />
                {log.rings.map((r) => (
                  <G key={`ring-${r.exponent}`}>
                    <Circle
                      cx={x({ re: 0, im: 0 })}
                      cy={y({ re: 0, im: 0 })}
                      r={r.radius / unit}
                      fill="none"
                      stroke={theme.color.rule}
                      strokeWidth={1}
                      strokeDasharray="2 3"
                    />
                    <ChartText
                      x={x({ re: 0, im: 0 }) + r.radius / unit / Math.SQRT2 + 3}
                      y={y({ re: 0, im: 0 }) - r.radius / unit / Math.SQRT2 - 3}
                    >
                      {decadeText(r.exponent)}
                    </ChartText>
                  </G>
                ))}
                <ChartText x={8} y={16} fill={theme.color.ink}>
                  {`distance from ${log.centerIs === 'branch point' ? 'the branch point' : 'the cut'}, log scale`}
                </ChartText>
              </G>
            ) : (
              <G>
                <Line x1={0} x2={width} y1={y(origin)} y2={y(origin)} stroke={theme.color.rule} strokeWidth={1} />
                <Line x1={x(origin)} x2={x(origin)} y1={0} y2={height} stroke={theme.color.rule} strokeWidth={1} />
                <ChartText x={width - 6} y={y(origin) - 6} textAnchor="end">
                  Re
                </ChartText>
                <ChartText x={x(origin) + 6} y={12}>
                  Im
                </ChartText>
              </G>
            )}
            {cuts.map((cut, i) => {
              const pts = fit.cutLine(cut);
              if (pts.length < 2) return null;
              return (
                <Polyline
                  key={`cut-${i}`}
                  points={pts.map((v) => `${x(v)},${y(v)}`).join(' ')}
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
                    <Polyline points={polyline(pts)} fill="none" stroke={color} strokeWidth={1.5} />
                  ) : null}
                  {pts.map((p, k) => (
                    <LineMarker key={k} {...at(p)} marker={line.marker} />
                  ))}
                </G>
              );
            })}
            {paths.map((path, i) => {
              const pts = path.points.filter(visible);
              if (pts.length < 2) return null;
              const mid = Math.floor(pts.length / 2);
              const a = at(pts[Math.max(0, mid - 1)]!);
              const b = at(pts[mid]!);
              const angle = (Math.atan2(b.cy - a.cy, b.cx - a.cx) * 180) / Math.PI;
              return (
                <G key={`path-${i}`}>
                  <Polyline points={polyline(pts)} fill="none" stroke={theme.color.ink} strokeWidth={1.5} />
                  <Path
                    d="M -6 -5 L 4 0 L -6 5 Z"
                    fill={theme.color.ink}
                    transform={`translate(${b.cx} ${b.cy}) rotate(${angle})`}
                  />
                </G>
              );
            })}
            {pointSets.map((set, i) => (
              <G key={`set-${i}`}>
                {set.points.filter(visible).map((p, k) => (
                  <PointDot key={k} {...at(p)} />
                ))}
              </G>
            ))}
            {marks
              .filter((m) => visible(m.at))
              .map((m, i) => (
                <MarkShape key={`mark-${i}`} {...at(m.at)} tone={m.tone} color={m.kind?.color} />
              ))}
            {branchPoints.filter(visible).map((p, i) => (
              <BranchPointShape key={`bp-${i}`} {...at(p)} />
            ))}
          </Svg>
        ) : null}
      </View>
      <View style={styles.zoom}>
        <SmallButton label="Zoom in" onPress={() => zoomBy(1)} accessibilityLabel="Zoom in on the picture" />
        <SmallButton label="Zoom out" onPress={() => zoomBy(-1)} accessibilityLabel="Zoom out of the picture" />
        <SmallButton label="Reset zoom" onPress={() => zoomBy(0)} accessibilityLabel="Reset zoom of the picture" />
        <Text style={styles.scale} testID={testID ? `${testID}-zoom` : undefined}>
          {zoomWords}
        </Text>
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
              pointSets.length === 1
                ? `points of the path “${pointSets[0]!.name}”`
                : `points of ${pointSets.length} paths`
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
        <Text style={styles.scale} testID={testID ? `${testID}-scale` : undefined}>
          {scaleWords}
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
  zoom: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: theme.space(2),
    paddingHorizontal: theme.space(3),
    paddingTop: theme.space(3),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
  },
  scale: { fontFamily: theme.font.mono, fontSize: 11, color: theme.color.inkFaint, width: '100%' },
});
