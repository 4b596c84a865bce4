import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { CATALOGUE_ENTRIES } from '../../../harness/catalogue/catalogue-entries';
import { referenceCall } from '../support/reference-call';

/** Points off every catalogue cut (the cuts lie on the axes) and away from the branch points. */
const POINTS: ComplexPair[] = [
  [0.3, 0.4],
  [-2.5, 1.5],
  [1.7, -0.6],
  [-0.2, -3],
  [4, 2],
  [-0.7, 0.05],
];

/**
 * |z·f′(z)| from the reference engine's own values: a central difference along the real axis
 * with step h = 2^−20·|z|, whose error is O(h²·|f‴|), far below the 1e−6 asked.
 */
function measured(fn: string, z: ComplexPair): number {
  const h = 2 ** -20 * Math.hypot(...z);
  const [a, b] = [
    referenceCall(fn, [[z[0] + h, z[1]]], 'signed-zero'),
    referenceCall(fn, [[z[0] - h, z[1]]], 'signed-zero'),
  ];
  return (Math.hypot(...z) * Math.hypot(a[0] - b[0], a[1] - b[1])) / (2 * h);
}

describe('catalogue sensitivities |z·f′(z)|', () => {
  // The derivatives of DLMF 4.24 and 4.38 (equation numbers from memory), checked against the engine's values.
  it.each(CATALOGUE_ENTRIES.filter((e) => e.sensitivity !== null).map((e) => [e.name]))(
    '%s states the size of z times its derivative, as a central difference of the reference measures it',
    (name) => {
      const entry = CATALOGUE_ENTRIES.find((e) => e.name === name)!;
      for (const z of POINTS) {
        const want = measured(name, z);
        expect({ name, z, ratio: Number((entry.sensitivity!(z) / want).toFixed(6)) }).toEqual({ name, z, ratio: 1 });
      }
    },
  );

  it('is null exactly for the functions whose sensitivity depends on their second argument', () => {
    expect(CATALOGUE_ENTRIES.filter((e) => e.sensitivity === null).map((e) => e.name)).toEqual(['nthroot', 'pow']);
  });
});
