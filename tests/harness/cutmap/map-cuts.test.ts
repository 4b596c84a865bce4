import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import type { Target } from '../../../harness/adapters/target';
import { mapCuts } from '../../../harness/cutmap/map-cuts';
import { FINGERPRINT_FUNCTIONS } from '../../../harness/fingerprint/fingerprint-functions';
import { parseDouble } from '../../../harness/reference/numbers/parse-double';
import { functionTarget } from '../support/function-target';
import { referenceCall } from '../support/reference-call';
import type { WireComplex } from '../../../shared/wire-complex';

const fn = (label: string) => FINGERPRINT_FUNCTIONS.find((f) => f.label === label)!;
const open = (name: string): Target => {
  const descriptor = discoverTargets().find((d) => d.name === name || (name === 'cmath' && d.library === 'cmath'));
  if (!descriptor) throw new Error(`${name} is installed with the project`);
  return descriptor.open();
};
const num = (w: WireComplex): ComplexPair => [parseDouble(w.re), parseDouble(w.im)];

describe('mapCuts', () => {
  it("finds complex.js 2.4.3's sqrt discontinuous along (-inf, 0] and nowhere else", async () => {
    // DLMF Figure 4.2.1 (§4.2(i)): the principal square root is cut along (−∞, 0].
    const map = await mapCuts(open('complex.js@2.4.3'), fn('sqrt'), [-4, -4], [4, 4], 81, 81);
    expect(map.verdict).toBe('matches');
    expect(map.expected).toEqual([expect.objectContaining({ label: '(-inf, 0]', coverage: 1, seen: true })]);
    const crossings = map.observed.flatMap((o) => o.points.map(num));
    // One crossing per grid column left of 0 (40 columns at −4 … −0.1), each within 1e-4 of the axis.
    expect(crossings).toHaveLength(40);
    expect(crossings.every(([re, im]) => re < 0 && Math.abs(im) < 1e-4)).toBe(true);
  });

  it('flags a square root whose cut lies on the positive real axis: an unexpected segment there and (-inf, 0] not seen', async () => {
    // i·√(−z) squares to z, so it is a square root, but −z crosses (−∞, 0] where z crosses [0, ∞).
    const Complex = require('complex.js') as new (re: number, im: number) => { sqrt(): { re: number; im: number } };
    const mutant = functionTarget('mutant/cut-on-positive-axis', ['sqrt'], (_op, [z]) => {
      const r = new Complex(-z![0], -z![1]).sqrt();
      return [-r.im, r.re];
    });
    const map = await mapCuts(mutant, fn('sqrt'), [-4, -4], [4, 4], 81, 81);
    expect(map.verdict).toBe('differs');
    expect(map.expected[0]).toMatchObject({ coverage: 0, seen: false });
    const unexpected = map.observed.filter((o) => !o.onExpectedCut).flatMap((o) => o.points.map(num));
    expect(unexpected.length).toBeGreaterThanOrEqual(39);
    expect(unexpected.every(([re, im]) => re > 0 && Math.abs(im) < 1e-4)).toBe(true);
  });

  it("finds complex.js 2.4.3's acot discontinuous along the negative real axis, where its values on the axis are no limit of either side", async () => {
    // acot z = atan(1/z) (DLMF 4.23.9) is continuous across (−∞, 0): acot(−2) = atan(−1/2).
    expect(referenceCall('acot', [[-2, 0]], 'signed-zero')[0]).toBeCloseTo(Math.atan(-0.5), 15);
    const map = await mapCuts(open('complex.js@2.4.3'), fn('acot'), [-4, -4], [4, 4], 81, 81);
    expect(map.verdict).toBe('differs');
    const off = map.observed.filter((o) => !o.onExpectedCut).flatMap((o) => o.points.map(num));
    expect(off.length).toBeGreaterThan(0);
    expect(off.every(([re, im]) => re < 0 && Math.abs(im) < 1e-4)).toBe(true);
    expect(map.expected[0]).toMatchObject({ label: '[-1, 1]·i', seen: true });
  });

  it("finds Python's cmath asinh cut along the imaginary axis beyond ±i", async () => {
    // casinh has its cuts on the imaginary axis outside [−i, i] (the casinh manual page; ISO/IEC 9899:2011 G.6.2.2 gives its special values).
    const target = open('cmath');
    try {
      const map = await mapCuts(target, fn('asinh'), [-3, -3], [3, 3], 61, 61);
      expect(map.verdict).toBe('matches');
      expect(map.expected.map((e) => [e.label, e.coverage])).toEqual([
        ['[1, +inf)·i', 1],
        ['(-inf, -1]·i', 1],
      ]);
    } finally {
      await target.close();
    }
  }, 20_000);

  it('reports the points where the target gives no finite value and keeps them out of the neighbour test', async () => {
    // log(0) = −∞ (ISO/IEC 9899:2011 G.6.3.2): the grid point at 0 has no finite value.
    const map = await mapCuts(open('complex.js@2.4.3'), fn('log'), [-1, -1], [1, 1], 21, 21);
    expect(map.notFinite).toBe(1);
    expect(map.verdict).toBe('matches');
  });
});
