import type { CallResult } from '../../../harness/adapters/call-result';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { mathjsTarget } from '../../../harness/adapters/mathjs-target';

const installed = discoverTargets().filter((t) => t.library === 'mathjs');
const versions = [...new Set(installed.map((t) => t.version))];
const find = (version: string, entry: string, predictable: boolean) =>
  installed.find((t) => t.version === version && t.settings.entry === entry && t.settings.predictable === predictable);

const close = (r: CallResult | undefined, re: number, im: number): boolean =>
  !!r &&
  'value' in r &&
  Math.abs(r.value[0] - re) <= 4e-16 * Math.max(1, Math.abs(re)) &&
  Math.abs(r.value[1] - im) <= 4e-16 * Math.max(1, Math.abs(im));

// The mathjs behaviour cited is from its own documentation (sqrt's examples, the `predictable` option);
// the Annex G clause (G.6.3.2) was checked against the C99 text.
describe('mathjsTarget', () => {
  it('offers four targets per installed version: complex and number entry, predictable off and on', () => {
    for (const version of versions) {
      expect(
        installed
          .filter((t) => t.version === version)
          .map((t) => t.name)
          .sort(),
      ).toEqual(
        [
          `mathjs@${version}/complex`,
          `mathjs@${version}/complex/predictable`,
          `mathjs@${version}/number`,
          `mathjs@${version}/number/predictable`,
        ].sort(),
      );
    }
  });

  it.each(versions)(
    'mathjs %s returns 2i for sqrt(−4) at the number entry point with predictable off, and NaN with it on',
    async (version) => {
      // mathjs's sqrt documentation: "math.sqrt(-4) // returns Complex 2i"; its configuration
      // documentation: with predictable: true, sqrt of a negative number returns NaN.
      const loose = find(version, 'number', false)?.open();
      const strict = find(version, 'number', true)?.open();
      expect(await loose?.evaluate('sqrt', [[[-4, 0]]])).toEqual([{ value: [0, 2] }]);
      expect(await strict?.evaluate('sqrt', [[[-4, 0]]])).toEqual([{ value: [NaN, 0] }]);
    },
  );

  it.each(versions)(
    'mathjs %s keeps complex arithmetic at the complex entry point whatever predictable says',
    async (version) => {
      for (const predictable of [false, true]) {
        const target = find(version, 'complex', predictable)?.open();
        // The principal square root of −4 + 0i is 2i; (1 + 2i)(3 + 4i) = −5 + 10i exactly.
        expect(await target?.evaluate('sqrt', [[[-4, 0]]])).toEqual([{ value: [0, 2] }]);
        expect(
          await target?.evaluate('mul', [
            [
              [1, 2],
              [3, 4],
            ],
          ]),
        ).toEqual([{ value: [-5, 10] }]);
        // The principal cube root of −8 is 2·e^{iπ/3} = 1 + √3 i.
        const [cube] = (await target?.evaluate('cbrt', [[[-8, 0]]])) ?? [];
        expect(close(cube, 1, Math.sqrt(3))).toBe(true);
        // log(−1 + 0i) = iπ, the principal value (ISO/IEC 9899:2011 G.6.3.2 puts the cut on the negative real axis).
        expect(await target?.evaluate('log', [[[-1, 0]]])).toEqual([{ value: [0, Math.PI] }]);
      }
    },
  );

  it.each(versions)(
    'mathjs %s answers an error, not a throw, where a function refuses complex input (nthRoot)',
    async (version) => {
      const target = find(version, 'complex', false)?.open();
      const [result] =
        (await target?.evaluate('nthroot', [
          [
            [-8, 0],
            [3, 0],
          ],
        ])) ?? [];
      expect(result).toEqual({ error: expect.stringMatching(/nthRoot/) });
      // At the number entry point the same call is real and mathjs takes the real root.
      const real = find(version, 'number', false)?.open();
      expect(
        await real?.evaluate('nthroot', [
          [
            [-8, 0],
            [3, 0],
          ],
        ]),
      ).toEqual([{ value: [-2, 0] }]);
    },
  );

  it('passes a real argument as a number at the number entry point, dropping the sign of its zero imaginary part', async () => {
    const numberEntry = mathjsTarget('mathjs', '15.2.0', 'number', false, '2.4.3');
    const complexEntry = mathjsTarget('mathjs', '15.2.0', 'complex', false, '2.4.3');
    // (−0 − 0i) + (−0 − 0i): as numbers −0 + −0 = −0 with no imaginary part (read as +0);
    // as complex numbers both parts stay −0 (IEEE 754 §6.3: x + x keeps the sign of x for zeros).
    const both: [number, number][] = [
      [-0, -0],
      [-0, -0],
    ];
    expect(await numberEntry.evaluate('add', [both])).toEqual([{ value: [-0, 0] }]);
    expect(await complexEntry.evaluate('add', [both])).toEqual([{ value: [-0, -0] }]);
    // Off the real axis the number entry point still has to pass a complex number.
    expect(await numberEntry.evaluate('neg', [[[-4, 1]]])).toEqual([{ value: [4, -1] }]);
  });

  it('loads nothing until the first call', () => {
    const target = mathjsTarget('mathjs-does-not-exist', '0.0.0', 'complex', false, 'none');
    expect(target.name).toBe('mathjs@0.0.0/complex');
    return expect(target.supports('sqrt')).rejects.toThrow(/Cannot find module 'mathjs-does-not-exist'/);
  });
});
