import fc from 'fast-check';
import type { PropertyCheck } from '../../shared/schemas/property-check-schema';
import type { ComplexPair } from '../adapters/complex-pair';
import type { PlaneCut } from '../cuts/plane-cut';
import { parseDouble } from '../reference/numbers/parse-double';

/** Along a ray-shaped cut, most points are within this distance of its finite end… */
const NEAR_ALONG = 8;
/** …and the rest reach out to here, where doubles are still 1e-10 apart. */
const FAR_ALONG = 1e6;

const unit = fc.double({ min: -1, max: 1, noNaN: true });
/** Which part of a point to replace by an exact zero (signed): most points keep both. */
const zeroPart = fc.constantFrom<'none' | 're' | 'im'>('none', 'none', 'none', 're', 'im');

function withZero([re, im]: ComplexPair, part: 'none' | 're' | 'im', negative: boolean): ComplexPair {
  const zero = negative ? -0 : 0;
  if (part === 're') return [zero, im];
  if (part === 'im') return [re, zero];
  return [re, im];
}

/**
 * Points of a property check's region as a fast-check arbitrary (shrinking towards the
 * region's centre, the cut, and exact zeros):
 * - `disc` and `box`: uniform in the region, and one point in five with a real or imaginary
 *   part replaced by an exact +0 or −0 (the axes are where zero signs choose a side);
 * - `near-cuts`: a point on one of the expected cuts, away from its finite end by a positive
 *   distance, moved off it along the normal by an offset in [0, distance] to either side; an
 *   offset of zero puts it exactly on the cut, with +0 or −0 in the across part for a cut on
 *   an axis. Needs the expected cuts; without them (or with none) gives the reason instead.
 */
export function regionArbitrary(
  region: PropertyCheck['region'],
  cuts: readonly PlaneCut[] | null,
): { arbitrary: fc.Arbitrary<ComplexPair> } | { reason: string } {
  if (region.kind === 'disc') {
    const [cx, cy, r] = [parseDouble(region.center.re), parseDouble(region.center.im), parseDouble(region.radius)];
    if (!(r > 0) || !Number.isFinite(r) || !Number.isFinite(cx) || !Number.isFinite(cy))
      return { reason: 'the disc needs a finite centre and a positive finite radius' };
    const arbitrary = fc
      .tuple(unit, unit, zeroPart, fc.boolean())
      .filter(([u, v]) => u * u + v * v <= 1)
      .map(([u, v, part, negative]) => withZero([cx + r * u, cy + r * v], part, negative))
      .filter(([x, y]) => Math.hypot(x - cx, y - cy) <= r);
    return { arbitrary };
  }
  if (region.kind === 'box') {
    const lo: ComplexPair = [parseDouble(region.min.re), parseDouble(region.min.im)];
    const hi: ComplexPair = [parseDouble(region.max.re), parseDouble(region.max.im)];
    if (![...lo, ...hi].every(Number.isFinite) || !(lo[0] < hi[0] && lo[1] < hi[1]))
      return { reason: 'the box needs finite corners with min below and left of max' };
    const arbitrary = fc
      .tuple(
        fc.double({ min: lo[0], max: hi[0], noNaN: true }),
        fc.double({ min: lo[1], max: hi[1], noNaN: true }),
        zeroPart,
        fc.boolean(),
      )
      .map(([x, y, part, negative]) => withZero([x, y], part, negative))
      .filter(([x, y]) => x >= lo[0] && x <= hi[0] && y >= lo[1] && y <= hi[1]);
    return { arbitrary };
  }
  const distance = parseDouble(region.distance);
  if (!(distance > 0) || !Number.isFinite(distance)) return { reason: 'near-cuts needs a positive finite distance' };
  if (cuts === null)
    return {
      reason:
        'the expected cuts of this subject are not known (a principal subject that is not one catalogue function of z)',
    };
  if (cuts.length === 0) return { reason: 'the subject has no cuts to sample near' };
  const along = fc.oneof(
    { arbitrary: fc.double({ min: Number.MIN_VALUE, max: NEAR_ALONG, noNaN: true }), weight: 3 },
    { arbitrary: fc.double({ min: NEAR_ALONG, max: FAR_ALONG, noNaN: true }), weight: 1 },
  );
  const fraction = fc.double({ min: Number.MIN_VALUE, max: 1, maxExcluded: true, noNaN: true });
  const offset = fc.oneof(
    { arbitrary: fc.constant(0), weight: 1 },
    { arbitrary: fc.double({ min: 0, max: distance, noNaN: true }), weight: 3 },
  );
  const arbitrary = fc
    .tuple(fc.integer({ min: 0, max: cuts.length - 1 }), along, fraction, offset, fc.boolean())
    .map(([index, a, f, delta, below]): ComplexPair | null => {
      const cut = cuts[index]!;
      const [dx, dy] = [cut.to[0] - cut.from[0], cut.to[1] - cut.from[1]];
      const length = Math.hypot(dx, dy);
      const s = cut.toInfinity ? a / length : f;
      // Near a finite end at ±1 a tiny distance rounds back onto the end itself, which is a
      // branch point, not a point of the cut: such draws are dropped.
      if (cut.from[0] + s * dx === cut.from[0] && cut.from[1] + s * dy === cut.from[1]) return null;
      const side = below ? -1 : 1;
      if (dy === 0) {
        // On a horizontal cut the across part is exact: ±δ, or ±0 on the cut itself.
        const y = cut.from[1] + side * delta;
        return [cut.from[0] + s * dx, y === 0 ? (below ? -0 : 0) : y];
      }
      if (dx === 0) {
        const x = cut.from[0] - side * delta;
        return [x === 0 ? (below ? 0 : -0) : x, cut.from[1] + s * dy];
      }
      // Oblique cuts: the left normal (−dy, dx)/|d|; "below" is the right-hand side walking from `from`.
      return [cut.from[0] + s * dx - (side * delta * dy) / length, cut.from[1] + s * dy + (side * delta * dx) / length];
    })
    .filter((z): z is ComplexPair => z !== null);
  return { arbitrary };
}
