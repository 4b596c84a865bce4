import type { CutMap } from '../../shared/cut-map';
import type { ComplexPair } from '../adapters/complex-pair';
import type { Target } from '../adapters/target';
import type { FingerprintFunction } from '../fingerprint/fingerprint-function';
import { buildPath } from '../paths/build-path';
import { formatDouble } from '../reference/numbers/format-double';
import { clipCut } from './clip-cut';
import { distanceToSegment } from './distance-to-segment';
import { findCrossings } from './find-crossings';
import { mergeCrossings } from './merge-crossings';

/**
 * A crossing is on an expected cut when it is within this share of a cell of it: bisection
 * puts a crossing within 2^−30 of a cell of the discontinuity, so anything further is elsewhere.
 */
const ON_CUT = 1e-3;
/** An expected cut counts as seen when discontinuities were found on this share of the grid lines crossing it. */
const SEEN = 0.9;

const wire = ([re, im]: ComplexPair) => ({ re: formatDouble(re), im: formatDouble(im) });

/**
 * The cut map of one function of a target over the box [min, max] (shared/cut-map.ts): the
 * function is evaluated on a columns × rows grid (paths module, `grid`), discontinuities
 * between neighbours are found and refined (find-crossings.ts), split into those on and off
 * the expected cuts, merged into segments (merge-crossings.ts), and compared with the function's expected cuts from the reference
 * catalogue, clipped to the box.
 *
 * Coverage of an expected cut counts the grid lines that cross it at least one cell away
 * from its ends (a jump right next to a branch point can fall into either neighbouring cell),
 * and for each whether a crossing lies on the cut within 1e-3 of a cell of that line.
 */
export async function mapCuts(
  target: Target,
  fn: FingerprintFunction,
  min: ComplexPair,
  max: ComplexPair,
  columns: number,
  rows: number,
): Promise<CutMap> {
  const points = buildPath({
    kind: 'grid',
    min: { re: min[0], im: min[1] },
    max: { re: max[0], im: max[1] },
    columns,
    rows,
  });
  const answers = await target.evaluate(
    fn.op,
    points.map((p) => [[p.z.re, p.z.im] as ComplexPair, ...fn.extra]),
  );
  const zs: ComplexPair[][] = [];
  const values: (ComplexPair | null)[][] = [];
  let notFinite = 0;
  points.forEach((p, i) => {
    const [row, column] = [Math.floor(i / columns), i % columns];
    (zs[row] ??= [])[column] = [p.z.re, p.z.im];
    const a = answers[i]!;
    const v = 'value' in a && Number.isFinite(a.value[0]) && Number.isFinite(a.value[1]) ? a.value : null;
    if (v === null) notFinite += 1;
    (values[row] ??= [])[column] = v;
  });
  const crossings = await findCrossings(target, fn.op, fn.extra, zs, values);
  const cell = Math.min((max[0] - min[0]) / (columns - 1), (max[1] - min[1]) / (rows - 1));
  const expected = fn.cuts.flatMap((cut) => {
    const clipped = clipCut(cut, min, max);
    return clipped ? [{ label: cut.label, segment: clipped }] : [];
  });
  const onExpected = (p: ComplexPair) =>
    expected.some((e) => distanceToSegment(p, e.segment[0], e.segment[1]) <= ON_CUT * cell);
  // Crossings on and off the expected cuts are merged separately, so a wrong stretch that
  // touches a right one (complex.js's acot on the negative real axis meets its cut at 0) stays apart.
  const observed = [true, false].flatMap((on) =>
    mergeCrossings(crossings.filter((c) => onExpected(c.at) === on)).map((line) => ({
      points: line.map(wire),
      onExpectedCut: on,
    })),
  );
  const gridRes = zs[0]!.map((z) => z[0]);
  const gridIms = zs.map((r) => r[0]![1]);
  const expectedOut = expected.map(({ label, segment: [a, b] }) => {
    const horizontal = a[1] === b[1];
    const vertical = a[0] === b[0];
    let lines: ComplexPair[] = [];
    if (horizontal) {
      const [lo, hi] = [Math.min(a[0], b[0]) + cell, Math.max(a[0], b[0]) - cell];
      lines = gridRes.filter((x) => x > lo && x < hi).map((x): ComplexPair => [x, a[1]]);
    } else if (vertical) {
      const [lo, hi] = [Math.min(a[1], b[1]) + cell, Math.max(a[1], b[1]) - cell];
      lines = gridIms.filter((y) => y > lo && y < hi).map((y): ComplexPair => [a[0], y]);
    }
    // A cut along the box's own edge has no neighbour pairs across it.
    const inside = (p: ComplexPair) => p[0] > min[0] && p[0] < max[0] && p[1] > min[1] && p[1] < max[1];
    lines = lines.filter(inside);
    const found = lines.filter((p) =>
      crossings.some((c) => Math.hypot(c.at[0] - p[0], c.at[1] - p[1]) <= ON_CUT * cell),
    );
    const coverage = lines.length > 0 ? found.length / lines.length : null;
    return { label, from: wire(a), to: wire(b), coverage, seen: coverage === null || coverage >= SEEN };
  });
  const verdict = observed.every((o) => o.onExpectedCut) && expectedOut.every((e) => e.seen) ? 'matches' : 'differs';
  return {
    target: target.name,
    function: fn.label,
    box: { min: wire(min), max: wire(max) },
    columns,
    rows,
    verdict,
    statement:
      `Evidence from a ${columns}x${rows} grid (cells of ${formatDouble(cell)}) with each jump between neighbours bisected 30 times. ` +
      `A cut shorter than a cell, a cut between two parallel grid lines, or a jump smaller than 8 median steps can be missed; ` +
      `which side of a cut is closed is not examined here (see the fingerprint). Not a certification of the library.`,
    observed,
    expected: expectedOut,
    notFinite,
  };
}
