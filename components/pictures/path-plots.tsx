import { useState, type ReactNode } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Circle, G, Line, Path, Polyline, Rect } from 'react-native-svg';
import { theme } from '../../constants/theme';
import type { FailurePathPoint, FailurePathView } from '../../shared/failure-path-view';
import { DIAGNOSIS_STYLES } from '../failures/diagnosis-styles';
import { formatUlps } from '../../shared/format-ulps';
import { SkText } from '../ui/sk-text';
import { formulaSpeech } from '../ui/formula-speech';
import { ChartText } from './chart-text';
import { LegendEntry } from './legend-entry';

/** Two neighbouring points whose arguments differ by more than this (radians) are a jump, not a slope: a 65-point circle turns ~0.1 rad a step. */
const JUMP = 1;
const HEIGHT = 230;
const M = { left: 58, right: 16, top: 18, bottom: 44 };
const EXPECTED_COLOR = theme.color.accent;
const LIBRARY_COLOR = theme.color.danger;

type Series = 'expected' | 'library';

const xOf = (p: FailurePathPoint, axis: FailurePathView['axis']) => (axis === 't' ? p.t : p.index);
const round = (v: number) => Number(v.toPrecision(3));

/** Where a series of arguments jumps: the middle of each step whose change exceeds JUMP, with the step's ends. */
function jumpsOf(
  points: FailurePathPoint[],
  axis: FailurePathView['axis'],
  series: Series,
): { at: number; from: number; to: number }[] {
  const out: { at: number; from: number; to: number }[] = [];
  const arg = (p: FailurePathPoint) => (series === 'expected' ? p.expectedArg : p.actualArg);
  for (let i = 1; i < points.length; i++) {
    const a = arg(points[i - 1]!);
    const b = arg(points[i]!);
    if (a === null || b === null || Math.abs(b - a) <= JUMP) continue;
    const from = xOf(points[i - 1]!, axis);
    const to = xOf(points[i]!, axis);
    out.push({ at: (from + to) / 2, from, to });
  }
  return out;
}

/** "the library jumps at t ≈ 0.281 and 0.75", or "the reference does not jump". */
const jumpsAt = (who: string, ts: number[]) =>
  ts.length === 0
    ? `${who} does not jump`
    : `${who} jumps at t ≈ ${ts.map(round).join(ts.length === 2 ? ' and ' : ', ')}`;

/** Splits a series into runs with no jump inside, so a line is never drawn across a jump. */
function pieces(points: FailurePathPoint[], value: (p: FailurePathPoint) => number | null): FailurePathPoint[][] {
  const out: FailurePathPoint[][] = [];
  let cur: FailurePathPoint[] = [];
  for (const p of points) {
    const v = value(p);
    const last = cur[cur.length - 1];
    if (v === null || (last && Math.abs(v - (value(last) as number)) > JUMP)) {
      if (cur.length) out.push(cur);
      cur = v === null ? [] : [p];
    } else cur.push(p);
  }
  if (cur.length) out.push(cur);
  return out;
}

/**
 * Two plots along the case's path: the error in ulps of every point (log scale, with the
 * tolerance), and the argument of the expected and of the library's value, so a jump at the
 * wrong place shows as a step in one line and not the other. Both mark this case; jumps are
 * named in words under the plots, and each series has its own line style and marker shape.
 */
export function PathPlots({ view }: { view: FailurePathView }) {
  const [width, setWidth] = useState(360);
  const onLayout = (e: LayoutChangeEvent) => {
    const w = Math.round(e.nativeEvent.layout.width);
    if (w > 0) setWidth(w);
  };
  const pts = [...view.points].sort((a, b) => xOf(a, view.axis) - xOf(b, view.axis));
  const xs = pts.map((p) => xOf(p, view.axis));
  const x0 = Math.min(...xs, view.axis === 't' ? 0 : 0);
  const x1 = Math.max(...xs, view.axis === 't' ? 1 : 1);
  const innerW = Math.max(1, width - M.left - M.right);
  const innerH = HEIGHT - M.top - M.bottom;
  const x = (v: number) => M.left + ((v - x0) / (x1 - x0 || 1)) * innerW;
  const focus = view.points.find((p) => p.index === view.focusIndex);
  const xLabel = view.axis === 't' ? 't along the path (0 = start, 1 = end)' : 'point number along the path';

  // Ulps on a log scale: 0 at the bottom, at least a decade above the tolerance and the worst point.
  const finiteUlps = pts.map((p) => p.ulps).filter((u): u is number => u !== null && Number.isFinite(u));
  const tolUlps = view.tolerance.ulps;
  const top = Math.max(1, Math.ceil(Math.log10(1 + Math.max(tolUlps ?? 1, ...finiteUlps)) + 0.5));
  const yU = (u: number) => M.top + innerH - (Math.log10(1 + u) / top) * innerH;
  const unplaced = pts.filter((p) => p.outcome !== 'pass' && (p.ulps === null || !Number.isFinite(p.ulps)));
  const ceiling = M.top + 6;

  const yA = (a: number) => M.top + ((Math.PI - a) / (2 * Math.PI)) * innerH;
  // Only a continuous path has jumps: a straddle's or a grid's neighbours lie across a cut or a row apart.
  const continuous = view.axis === 't';
  const expectedJumps = continuous ? jumpsOf(pts, view.axis, 'expected') : [];
  const libraryJumps = continuous ? jumpsOf(pts, view.axis, 'library') : [];
  // Beyond a few jumps the labels would overprint each other; the dotted lines and the words remain.
  const labelJumps = expectedJumps.length + libraryJumps.length <= 6;
  const wrongArg = pts.filter(
    (p) =>
      p.actualFrom === 'stored' &&
      p.actualArg !== null &&
      p.expectedArg !== null &&
      Math.abs(p.actualArg - p.expectedArg) > 1e-6,
  );
  const unexpected = libraryJumps.filter((j) => !expectedJumps.some((e) => e.from === j.from && e.to === j.to));
  const missing = expectedJumps.filter((e) => !libraryJumps.some((j) => e.from === j.from && e.to === j.to));
  const where = (js: { from: number; to: number }[]) =>
    js
      .map((j) =>
        view.axis === 't' ? `between t = ${round(j.from)} and ${round(j.to)}` : `between points ${j.from} and ${j.to}`,
      )
      .join('; ');

  const argWords = !continuous
    ? `These points are not a continuous path (${view.path.kind === 'points' ? 'a list of points has nothing between them' : `a ${view.path.kind} goes back and forth across the cut`}), so the argument is compared point by point: ${
        wrongArg.length
          ? `the library's value has another argument at ${wrongArg.length} point${wrongArg.length === 1 ? '' : 's'} (${wrongArg
              .slice(0, 8)
              .map((p) => p.index)
              .join(', ')}${wrongArg.length > 8 ? ', …' : ''}).`
          : 'the library has the expected argument at every point.'
      }`
    : `The reference's argument ${expectedJumps.length ? `jumps ${where(expectedJumps)}` : 'does not jump'}; the library's ${libraryJumps.length ? `jumps ${where(libraryJumps)}` : 'does not jump'}.` +
      (unexpected.length ? ` The library jumps where the reference does not: ${where(unexpected)}.` : '') +
      (missing.length ? ` The library does not jump where the reference does: ${where(missing)}.` : '') +
      (unexpected.length || missing.length ? '' : ' Every jump is where the reference has one.');

  const frame = (children: ReactNode, yTicks: { y: number; text: string }[], yTitle: string) => (
    <Svg width={width} height={HEIGHT}>
      <Rect x={0} y={0} width={width} height={HEIGHT} fill={theme.color.panel} />
      {yTicks.map((tick) => (
        <G key={tick.text}>
          <Line x1={M.left} x2={width - M.right} y1={tick.y} y2={tick.y} stroke={theme.color.rule} strokeWidth={1} />
          <ChartText x={M.left - 6} y={tick.y + 4} fontSize={11} fill={theme.color.inkSoft} textAnchor="end">
            {tick.text}
          </ChartText>
        </G>
      ))}
      <Line x1={M.left} x2={M.left} y1={M.top} y2={M.top + innerH} stroke={theme.color.inkFaint} strokeWidth={1} />
      <Line
        x1={M.left}
        x2={width - M.right}
        y1={M.top + innerH}
        y2={M.top + innerH}
        stroke={theme.color.inkFaint}
        strokeWidth={1}
      />
      {[x0, (x0 + x1) / 2, x1].map((v) => (
        <ChartText
          key={`xt-${v}`}
          x={x(v)}
          y={M.top + innerH + 14}
          fontSize={11}
          fill={theme.color.inkSoft}
          textAnchor="middle"
        >
          {String(round(v))}
        </ChartText>
      ))}
      <ChartText x={M.left + innerW / 2} y={HEIGHT - 8} fontSize={11} fill={theme.color.inkSoft} textAnchor="middle">
        {xLabel}
      </ChartText>
      <ChartText
        x={12}
        y={M.top + innerH / 2}
        fontSize={11}
        fill={theme.color.inkSoft}
        textAnchor="middle"
        transform={`rotate(-90 12 ${M.top + innerH / 2})`}
      >
        {yTitle}
      </ChartText>
      {focus ? (
        <G>
          <Line
            x1={x(xOf(focus, view.axis))}
            x2={x(xOf(focus, view.axis))}
            y1={M.top}
            y2={M.top + innerH}
            stroke={theme.color.focus}
            strokeWidth={2}
            strokeDasharray="4 3"
          />
          <ChartText x={x(xOf(focus, view.axis)) + 4} y={M.top + 10} fontSize={11} fill={theme.color.ink}>
            this case
          </ChartText>
        </G>
      ) : null}
      {children}
    </Svg>
  );

  // At most six labelled decades, so 1e0…1e19 does not crowd the axis.
  const decade = Math.max(1, Math.ceil(top / 5));
  const ulpTicks = Array.from({ length: Math.floor(top / decade) + 1 }, (_, i) => i * decade).map((k) => ({
    y: yU(10 ** k - 1),
    text: k === 0 ? '0' : k <= 3 ? String(10 ** k) : `1e${k}`,
  }));
  const argTicks = [
    { a: Math.PI, text: 'π' },
    { a: Math.PI / 2, text: 'π/2' },
    { a: 0, text: '0' },
    { a: -Math.PI / 2, text: '−π/2' },
    { a: -Math.PI, text: '−π' },
  ].map((t) => ({ y: yA(t.a), text: t.text }));

  return (
    <View style={styles.root} onLayout={onLayout}>
      <View style={styles.plot}>
        <SkText variant="smallLabel" tone="ink" style={styles.title}>
          Error in ulps at each point
        </SkText>
        <View
          accessible
          accessibilityRole="image"
          accessibilityLabel={formulaSpeech(
            `Error in ulps along the path ${view.path.name}: ${pts.filter((p) => p.outcome !== 'pass').length} points over the tolerance, the worst ${formatUlps(finiteUlps.length ? Math.max(...finiteUlps) : null)} ulps. Up: ulps on a log scale from 0 to ${ulpTicks[ulpTicks.length - 1]!.text}; across: ${xLabel}.`,
          )}
        >
          {frame(
            <G>
              {tolUlps !== null ? (
                <G>
                  <Line
                    x1={M.left}
                    x2={width - M.right}
                    y1={yU(tolUlps)}
                    y2={yU(tolUlps)}
                    stroke={theme.color.inkSoft}
                    strokeWidth={1.5}
                    strokeDasharray="6 4"
                  />
                  <ChartText
                    x={width - M.right - 4}
                    y={yU(tolUlps) - 4}
                    fontSize={11}
                    fill={theme.color.inkSoft}
                    textAnchor="end"
                  >
                    {`tolerance ${tolUlps} ulps`}
                  </ChartText>
                </G>
              ) : null}
              {pts.map((p) => {
                const cx = x(xOf(p, view.axis));
                if (p.outcome === 'pass')
                  return <Circle key={p.index} cx={cx} cy={yU(0)} r={2.5} fill={EXPECTED_COLOR} />;
                const color =
                  DIAGNOSIS_STYLES[
                    p.diagnosis ??
                      (p.outcome === 'skipped' ? 'skipped' : p.outcome === 'error' ? 'error' : 'unexplained')
                  ].color;
                const cy = p.ulps !== null && Number.isFinite(p.ulps) ? yU(p.ulps) : ceiling;
                return <Cross key={p.index} cx={cx} cy={cy} color={color} />;
              })}
              {unplaced.length ? (
                <ChartText
                  x={M.left + 4}
                  y={ceiling - 8 < 10 ? ceiling + 14 : ceiling - 8}
                  fontSize={10}
                  fill={theme.color.inkSoft}
                >
                  ∞ / no ulps (top row)
                </ChartText>
              ) : null}
            </G>,
            ulpTicks,
            'ulps (log scale)',
          )}
        </View>
        <View style={styles.legend}>
          <LegendEntry text="passed: within tolerance, error not stored">
            <Circle cx={9} cy={8} r={2.5} fill={EXPECTED_COLOR} />
          </LegendEntry>
          {[
            ...new Set(
              pts
                .filter((p) => p.outcome !== 'pass')
                .map(
                  (p) =>
                    p.diagnosis ??
                    (p.outcome === 'skipped' ? 'skipped' : p.outcome === 'error' ? 'error' : 'unexplained'),
                ),
            ),
          ].map((tone) => (
            <LegendEntry key={tone} text={`${DIAGNOSIS_STYLES[tone].glyph} failed: ${DIAGNOSIS_STYLES[tone].word}`}>
              <Cross cx={9} cy={8} color={DIAGNOSIS_STYLES[tone].color} />
            </LegendEntry>
          ))}
        </View>
      </View>

      <View style={styles.plot}>
        <SkText variant="smallLabel" tone="ink" style={styles.title}>
          Argument of the value along the path
        </SkText>
        <View
          accessible
          accessibilityRole="image"
          accessibilityLabel={formulaSpeech(
            `Argument of the expected and the library's value along the path ${view.path.name}, up from −π to π, across ${xLabel}. ${argWords}`,
          )}
        >
          {frame(
            <G>
              {continuous
                ? pieces(pts, (p) => p.expectedArg).map((run, i) => (
                    <Polyline
                      key={`e-${i}`}
                      points={run.map((p) => `${x(xOf(p, view.axis))},${yA(p.expectedArg as number)}`).join(' ')}
                      fill="none"
                      stroke={EXPECTED_COLOR}
                      strokeWidth={2.5}
                    />
                  ))
                : pts
                    .filter((p) => p.expectedArg !== null)
                    .map((p) => (
                      <Circle
                        key={`e-${p.index}`}
                        cx={x(xOf(p, view.axis))}
                        cy={yA(p.expectedArg as number)}
                        r={3}
                        fill={EXPECTED_COLOR}
                      />
                    ))}
              {continuous
                ? pieces(pts, (p) => p.actualArg).map((run, i) => (
                    <Polyline
                      key={`l-${i}`}
                      points={run.map((p) => `${x(xOf(p, view.axis))},${yA(p.actualArg as number)}`).join(' ')}
                      fill="none"
                      stroke={LIBRARY_COLOR}
                      strokeWidth={1.5}
                      strokeDasharray="5 3"
                    />
                  ))
                : null}
              {pts
                .filter((p) => p.actualFrom === 'stored' && p.actualArg !== null)
                .map((p) => (
                  <Cross
                    key={`c-${p.index}`}
                    cx={x(xOf(p, view.axis))}
                    cy={yA(p.actualArg as number)}
                    color={LIBRARY_COLOR}
                  />
                ))}
              {expectedJumps.map((j) => (
                <G key={`ej-${j.at}`}>
                  <Line
                    x1={x(j.at)}
                    x2={x(j.at)}
                    y1={M.top}
                    y2={M.top + innerH}
                    stroke={EXPECTED_COLOR}
                    strokeWidth={1}
                    strokeDasharray="2 3"
                  />
                  {labelJumps ? (
                    <ChartText
                      x={x(j.at)}
                      y={M.top + innerH - 4}
                      fontSize={10}
                      fill={EXPECTED_COLOR}
                      textAnchor="middle"
                    >
                      reference jump
                    </ChartText>
                  ) : null}
                </G>
              ))}
              {unexpected.map((j) => (
                <G key={`lj-${j.at}`}>
                  <Line
                    x1={x(j.at)}
                    x2={x(j.at)}
                    y1={M.top}
                    y2={M.top + innerH}
                    stroke={LIBRARY_COLOR}
                    strokeWidth={1.5}
                    strokeDasharray="2 2"
                  />
                  {labelJumps ? (
                    <ChartText x={x(j.at)} y={M.top + 24} fontSize={10} fill={LIBRARY_COLOR} textAnchor="middle">
                      library jump ≠
                    </ChartText>
                  ) : null}
                </G>
              ))}
            </G>,
            argTicks,
            'arg of value (rad)',
          )}
        </View>
        <View style={styles.legend}>
          <LegendEntry text="expected (reference)">
            {continuous ? (
              <Line x1={1} x2={17} y1={8} y2={8} stroke={EXPECTED_COLOR} strokeWidth={2.5} />
            ) : (
              <Circle cx={9} cy={8} r={3} fill={EXPECTED_COLOR} />
            )}
          </LegendEntry>
          <LegendEntry text={continuous ? 'library (dashed; × where stored)' : 'library (× where stored)'}>
            {continuous ? (
              <Line x1={1} x2={17} y1={8} y2={8} stroke={LIBRARY_COLOR} strokeWidth={1.5} strokeDasharray="4 2" />
            ) : null}
            {continuous ? null : <Cross cx={9} cy={8} color={LIBRARY_COLOR} />}
          </LegendEntry>
        </View>
        <SkText variant="caption" tone="ink" style={styles.words} testID="jump-words">
          {argWords}
        </SkText>
        {view.jumps ? (
          <SkText variant="caption" tone="ink" style={styles.words}>
            The run&apos;s own jump check: {jumpsAt('the reference', view.jumps.expected)};{' '}
            {jumpsAt('the library', view.jumps.library)}.
          </SkText>
        ) : null}
      </View>
    </View>
  );
}

function Cross({ cx, cy, color }: { cx: number; cy: number; color: string }) {
  return (
    <Path
      d={`M ${cx - 4} ${cy - 4} L ${cx + 4} ${cy + 4} M ${cx - 4} ${cy + 4} L ${cx + 4} ${cy - 4}`}
      stroke={color}
      strokeWidth={2}
    />
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(4) },
  plot: {
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    overflow: 'hidden',
    backgroundColor: theme.color.panel,
  },
  title: { paddingHorizontal: theme.space(3), paddingTop: theme.space(3) },
  legend: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    gap: theme.space(3),
    paddingHorizontal: theme.space(3),
    paddingVertical: theme.space(2),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
  },
  words: { paddingHorizontal: theme.space(3), paddingBottom: theme.space(3), lineHeight: 19 },
});
