import { geometryNumber } from './geometry-number';
import { geometryPoint } from './geometry-point';
import { lerpComponent } from './lerp-component';
import { nextDouble } from './next-double';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';

type Point = { re: number; im: number };

/** The default offsets (docs/suite-format.md); 5e-324 is the least subnormal, which only survives next to 0. */
const DEFAULT_OFFSETS = ['1e-3', '1e-9', '1e-300', '5e-324'];

/**
 * Points on both sides of a cut and on it. For each position along the cut and each
 * offset δ, one point on each side at distance δ along the normal, ordered across
 * the cut (far below … near below, on, near above … far above). Labels name the side
 * and the offset as written: "above 1e-9" / "below 1e-9" for a horizontal cut,
 * "right" / "left" for a vertical one, and for an oblique cut "left" / "right" as seen
 * walking from the cut's start.
 *
 * A cut lying on an axis (a horizontal cut with im = 0, a vertical one with re = 0)
 * is straddled exactly on it twice, with +0 and −0 in that part ("on +0", "on -0"):
 * that is where Annex G lets the zero sign choose the side. Any other cut gets one
 * "on" point.
 *
 * An offset smaller than half an ulp of the coordinate would round back onto the cut;
 * it is replaced by the next double on that side and labelled "(nearest double)".
 * For an oblique cut that nudge moves the coordinate with the larger normal
 * component by one ulp; such points are on the intended side only to within
 * rounding of the cut's own line.
 */
export function straddlePath(spec: Extract<PathSpec, { kind: 'straddle' }>): PathPoint[] {
  const from = geometryPoint(spec.cut.from, 'cut.from');
  const towards = geometryPoint(
    spec.cut.kind === 'segment' ? spec.cut.to : spec.cut.through,
    spec.cut.kind === 'segment' ? 'cut.to' : 'cut.through',
  );
  const d = { re: towards.re - from.re, im: towards.im - from.im };
  const length = Math.hypot(d.re, d.im);
  if (!(length > 0) || !Number.isFinite(length)) throw new RangeError('a cut needs two distinct finite points');
  const horizontal = d.im === 0;
  const vertical = d.re === 0;
  // The left normal (−d.im, d.re)/|d|, exact for axis-parallel cuts.
  const normal: Point = horizontal
    ? { re: 0, im: Math.sign(d.re) }
    : vertical
      ? { re: -Math.sign(d.im), im: 0 }
      : { re: -d.im / length, im: d.re / length };
  const offsetTexts = (spec.offsets ?? DEFAULT_OFFSETS).map(String);
  const offsets = offsetTexts.map((o, i) => {
    const x = geometryNumber(o, `offsets[${i}]`);
    if (!(x > 0)) throw new RangeError(`offsets[${i}] must be positive, got ${o}`);
    return x;
  });
  const along = spec.along.map((a, i) => geometryNumber(a, `along[${i}]`));
  if (along.length === 0) throw new RangeError('along needs at least one position');
  const lo = Math.min(...along);
  const hi = Math.max(...along);
  const bases = along.map((a, i): { t: number; base: Point } => {
    if (spec.cut.kind === 'segment') {
      if (a < 0 || a > 1) throw new RangeError(`along[${i}] = ${a} is outside [0, 1] for a cut segment`);
      return { t: a, base: { re: lerpComponent(from.re, towards.re, a), im: lerpComponent(from.im, towards.im, a) } };
    }
    if (a < 0) throw new RangeError(`along[${i}] = ${a} is a negative distance along a ray`);
    const t = hi === lo ? 0 : (a - lo) / (hi - lo);
    const base = horizontal
      ? { re: from.re + Math.sign(d.re) * a, im: from.im }
      : vertical
        ? { re: from.re, im: from.im + Math.sign(d.im) * a }
        : { re: from.re + (a * d.re) / length, im: from.im + (a * d.im) / length };
    return { t, base };
  });
  const sideName = (sign: 1 | -1): string => {
    if (horizontal) return normal.im * sign > 0 ? 'above' : 'below';
    if (vertical) return normal.re * sign > 0 ? 'right' : 'left';
    return sign > 0 ? 'left' : 'right';
  };
  const offsetPoint = (base: Point, delta: number, sign: 1 | -1): { z: Point; nudged: boolean } => {
    const z = { re: base.re + sign * delta * normal.re, im: base.im + sign * delta * normal.im };
    const moved = horizontal ? z.im !== base.im : vertical ? z.re !== base.re : z.re !== base.re || z.im !== base.im;
    if (moved) return { z, nudged: false };
    const part: 're' | 'im' = Math.abs(normal.im) >= Math.abs(normal.re) ? 'im' : 're';
    const direction = Math.sign(sign * normal[part]) as 1 | -1;
    return { z: { ...base, [part]: nextDouble(base[part], direction) }, nudged: true };
  };
  const points: PathPoint[] = [];
  for (const { t, base } of bases) {
    const side = (sign: 1 | -1, order: number[]): void => {
      for (const k of order) {
        const { z, nudged } = offsetPoint(base, offsets[k] as number, sign);
        points.push({ t, z, label: `${sideName(sign)} ${offsetTexts[k]}${nudged ? ' (nearest double)' : ''}` });
      }
    };
    const bySize = offsets.map((_, k) => k).sort((i, j) => (offsets[i] as number) - (offsets[j] as number));
    const lower: 1 | -1 = sideName(-1) === 'below' || sideName(-1) === 'left' ? -1 : 1;
    side(lower, [...bySize].reverse());
    if (horizontal && base.im === 0) {
      points.push({ t, z: { re: base.re, im: 0 }, label: 'on +0' }, { t, z: { re: base.re, im: -0 }, label: 'on -0' });
    } else if (vertical && base.re === 0) {
      points.push({ t, z: { re: 0, im: base.im }, label: 'on +0' }, { t, z: { re: -0, im: base.im }, label: 'on -0' });
    } else {
      points.push({ t, z: { ...base }, label: 'on' });
    }
    side(lower === -1 ? 1 : -1, bySize);
  }
  return points;
}
