import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import { theme } from '../../constants/theme';
import type { CutMap } from '../../shared/cut-map';
import { SkText } from '../ui/sk-text';
import { PlanePicture, type PlanePoint } from './plane-picture';
import { formatComplexText } from '../../shared/format-complex-text';
import type { WireComplex } from '../../shared/wire-complex';

const point = (w: WireComplex): PlanePoint => ({ re: Number(w.re), im: Number(w.im) });
const percent = (x: number) => `${Math.round(x * 100)} %`;
/** The plane picture's margin on each side (components/pictures/plane-picture.tsx). */
const PAD = 28;

/**
 * Where one function of a target is really discontinuous over a box, drawn against the expected
 * cuts: expected cuts dashed, discontinuities found on them as dots, discontinuities elsewhere as
 * crosses named "unexpected". Under the picture, the verdict and each expected cut's coverage in
 * words, and what a grid can miss.
 */
export function CutMapPicture({ cutMap }: { cutMap: CutMap }) {
  const [width, setWidth] = useState(0);
  const [min, max] = [point(cutMap.box.min), point(cutMap.box.max)];
  // The picture takes the box's own proportions, so nothing outside the sampled box is shown as if it had been looked at.
  const height =
    width > 0
      ? Math.min(800, Math.max(200, Math.round(((width - 2 * PAD) * (max.im - min.im)) / (max.re - min.re) + 2 * PAD)))
      : 0;
  const unexpected = cutMap.observed.filter((o) => !o.onExpectedCut);
  const unseen = cutMap.expected.filter((e) => !e.seen);
  const label =
    `Cut map of ${cutMap.function} on ${cutMap.target} over Re ${min.re} to ${max.re}, Im ${min.im} to ${max.im}: ` +
    `${cutMap.expected.length} expected cut(s), ${cutMap.observed.length - unexpected.length} stretch(es) of discontinuity on them, ${unexpected.length} elsewhere.`;

  return (
    <View style={styles.wrap}>
      <SkText
        variant="label"
        tone="accent"
        style={[styles.verdict, cutMap.verdict === 'differs' && styles.differs]}
        testID="cut-map-verdict"
      >
        {cutMap.verdict === 'matches'
          ? `✓ Matches: every discontinuity found lies on an expected cut, and every expected cut was seen.`
          : `≠ Differs: ${[unexpected.length ? `${unexpected.length} stretch(es) of discontinuity off the expected cuts` : null, unseen.length ? `${unseen.length} expected cut(s) not seen` : null].filter(Boolean).join('; ')}.`}
      </SkText>
      <View style={styles.frame} onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))}>
        {width > 0 ? (
          <PlanePicture
            label={label}
            view={{ minRe: min.re, maxRe: max.re, minIm: min.im, maxIm: max.im }}
            cuts={cutMap.expected.map((e) => ({ points: [point(e.from), point(e.to)], toInfinity: false }))}
            lines={cutMap.observed.map((o) => ({
              name: o.onExpectedCut ? 'discontinuity found on an expected cut' : 'unexpected discontinuity',
              points: o.points.map(point),
              marker: o.onExpectedCut ? 'dot' : 'cross',
            }))}
            height={height}
            testID="cut-map-picture"
          />
        ) : null}
      </View>
      <View style={styles.list}>
        <SkText variant="smallLabel" tone="inkFaint" style={styles.head}>
          Expected cuts in this box
        </SkText>
        {cutMap.expected.length === 0 ? (
          <SkText variant="caption" tone="ink" style={styles.line}>
            None: the reference has no cut of {cutMap.function} inside this box.
          </SkText>
        ) : null}
        {cutMap.expected.map((e) => (
          <SkText variant="caption" tone="ink" key={`${e.label} ${e.from.re} ${e.from.im}`} style={styles.line}>
            {e.seen ? '✓' : '×'} {e.label} from {formatComplexText(e.from)} to {formatComplexText(e.to)}:{' '}
            {e.coverage === null
              ? 'crosses no grid line inside the box, so it could not be seen or missed'
              : `a jump on ${percent(e.coverage)} of the grid lines crossing it — ${e.seen ? 'seen' : 'not seen'}`}
          </SkText>
        ))}
        {unexpected.length ? (
          <SkText variant="smallLabel" tone="inkFaint" style={styles.head}>
            Discontinuities off the expected cuts
          </SkText>
        ) : null}
        {unexpected.map((o, i) => (
          <SkText variant="caption" tone="ink" key={i} style={styles.line}>
            × {o.points.length} crossing(s) from {formatComplexText(o.points[0])} to{' '}
            {formatComplexText(o.points[o.points.length - 1])}
          </SkText>
        ))}
        {cutMap.notFinite > 0 ? (
          <SkText variant="caption" tone="ink" style={styles.line}>
            {cutMap.notFinite} grid point(s) gave no finite value and took part in no comparison.
          </SkText>
        ) : null}
      </View>
      <SkText variant="caption" style={styles.statement}>
        {cutMap.statement}
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: theme.space(3) },
  frame: { width: '100%', maxWidth: 600 },
  verdict: { lineHeight: 24 },
  differs: { color: theme.color.danger },
  list: { gap: theme.space(1) },
  head: { textTransform: 'uppercase', letterSpacing: 0.8, marginTop: theme.space(2) },
  line: { lineHeight: 20 },
  statement: { lineHeight: 20, borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(3) },
});
