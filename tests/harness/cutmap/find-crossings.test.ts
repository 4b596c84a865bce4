import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { findCrossings } from '../../../harness/cutmap/find-crossings';
import { buildPath } from '../../../harness/paths/build-path';
import { functionTarget } from '../support/function-target';
import { referenceCall } from '../support/reference-call';

/** √(z − 0.37i): the principal root's cut moved up to the line Im z = 0.37, left of 0.37i — between grid rows. */
const shifted = functionTarget('shifted-sqrt', ['sqrt'], (_op, [z]) =>
  referenceCall('sqrt', [[z![0], z![1] - 0.37]], 'signed-zero'),
);

async function crossings(columns: number, rows: number) {
  const grid = buildPath({ kind: 'grid', min: { re: -2, im: -2 }, max: { re: 2, im: 2 }, columns, rows });
  const zs: ComplexPair[][] = [];
  const values: ComplexPair[][] = [];
  const answers = await shifted.evaluate(
    'sqrt',
    grid.map((p) => [[p.z.re, p.z.im]]),
  );
  grid.forEach((p, i) => {
    const [r, c] = [Math.floor(i / columns), i % columns];
    (zs[r] ??= [])[c] = [p.z.re, p.z.im];
    const a = answers[i]!;
    (values[r] ??= [])[c] = 'value' in a ? a.value : [NaN, NaN];
  });
  return findCrossings(shifted, 'sqrt', [], zs, values);
}

describe('findCrossings', () => {
  it('locates a jump between grid rows to within 1e-9 by bisection, once per column left of the branch point', async () => {
    const found = await crossings(41, 41);
    // Columns at −2, −1.9, …, −0.1 lie left of the branch point 0.37i: 20 crossings, each on a vertical edge.
    expect(found).toHaveLength(20);
    expect(found.every((c) => c.edge.kind === 'v' && Math.abs(c.at[1] - 0.37) < 1e-9 && c.at[0] < 0)).toBe(true);
  });

  it('does not report the steep but continuous neighbourhood of the branch point', async () => {
    const found = await crossings(41, 41);
    // √ changes like √h next to 0.37i: no crossing may sit right of the branch point.
    expect(found.some((c) => c.at[0] >= 0)).toBe(false);
  });
});
