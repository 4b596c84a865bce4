import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { complexJsTarget } from '../../../harness/adapters/complex-js-target';
import { discoverTargets } from '../../../harness/adapters/discover-targets';

type ComplexJs = {
  new (re: number, im: number): { re: number; im: number; [m: string]: unknown };
  prototype: Record<string, unknown>;
};

const installed = discoverTargets().filter((t) => t.library === 'complex.js');

// Annex G clauses cited here (G.6.3.1, G.6.3.2) were checked against the C99 text; the other values are exact arithmetic.
describe('complexJsTarget', () => {
  it.each(installed.map((t) => [t.name, t] as const))(
    '%s returns the principal values off the cuts',
    async (_name, descriptor) => {
      const target = descriptor.open();
      const results = await target.evaluate('sqrt', [[[-4, 0]], [[3, 4]]]);
      // The principal square root of −4 is 2i; of 3 + 4i it is 2 + i (exact: (2 + i)² = 3 + 4i).
      expect(results).toEqual([{ value: [0, 2] }, { value: [2, 1] }]);
      // exp(0) = 1 and log(1) = 0 exactly (ISO/IEC 9899:2011 G.6.3.1 cexp(+0 + i0) = 1 + i0; G.6.3.2 clog(1 + i0) = +0 + i0).
      expect(await target.evaluate('exp', [[[0, 0]]])).toEqual([{ value: [1, 0] }]);
      expect(await target.evaluate('log', [[[1, 0]]])).toEqual([{ value: [0, 0] }]);
      // (1 + 2i)(3 + 4i) = −5 + 10i, exact in doubles.
      expect(
        await target.evaluate('mul', [
          [
            [1, 2],
            [3, 4],
          ],
        ]),
      ).toEqual([{ value: [-5, 10] }]);
    },
  );

  it.each(installed.map((t) => [t.name, t] as const))(
    '%s reports cbrt and nthroot as unsupported rather than crashing',
    async (_name, descriptor) => {
      const target = descriptor.open();
      expect(await target.supports('cbrt')).toBe(false);
      expect(await target.supports('nthroot')).toBe(false);
      expect(await target.supports('acsch')).toBe(true);
      expect(await target.evaluate('cbrt', [[[8, 0]]])).toEqual([
        { error: `complex.js ${descriptor.version} has no cbrt` },
      ]);
    },
  );

  it.each(installed.map((t) => [t.name, t] as const))(
    '%s gives the function the value its constructor built, never patched afterwards',
    async (_name, descriptor) => {
      // Watch what the method sees as `this`: its output cannot tell, since complex.js 2.4.1's
      // constructor turns every −0 into +0, results included. Whatever new Complex(re, im)
      // builds is what a user's code calls the method on, so that is what the target must test.
      const mod = require(descriptor.settings.package as string) as ComplexJs & { default?: ComplexJs };
      const Complex = mod.default ?? mod;
      const original = Complex.prototype.neg as (this: { re: number; im: number }) => unknown;
      const seen: [number, number][] = [];
      Complex.prototype.neg = function (this: { re: number; im: number }) {
        seen.push([this.re, this.im]);
        return original.call(this);
      };
      try {
        await descriptor.open().evaluate('neg', [[[0, -0]], [[-0, 0]], [[-4, -0]]]);
      } finally {
        Complex.prototype.neg = original;
      }
      const built = ([re, im]: ComplexPair): [number, number] => {
        const z = new Complex(re, im);
        return [z.re, z.im];
      };
      expect(seen).toEqual([built([0, -0]), built([-0, 0]), built([-4, -0])]);
    },
  );

  it('builds complex.js 2.4.1 values with its constructor, so the −0 it drops reaches sqrt as +0', async () => {
    // Observed directly: complex.js 2.4.1's new Complex(-4, -0) has im +0 (the library's own behaviour).
    const Complex = require('complex.js-2.4.1') as ComplexJs;
    expect(Object.is(new Complex(-4, -0).im, 0)).toBe(true);
    const target = complexJsTarget('complex.js-2.4.1', '2.4.1');
    // sqrt(−4 + 0i) = +2i, the principal value above the cut; the input −4 − 0i would give −2i under
    // ISO/IEC 9899:2011 G.6.4.2 (csqrt(conj(z)) = conj(csqrt(z))), which this constructor cannot deliver.
    expect(await target.evaluate('sqrt', [[[-4, -0]]])).toEqual([{ value: [0, 2] }]);
  });

  it('names its entries, the two-number constructor first and the default', () => {
    const target = complexJsTarget('complex.js', '2.4.3');
    expect(target.entries?.map((e) => [e.name, e.call, e.default])).toEqual([
      ['complex', 'new Complex(re, im)', true],
      ['object', 'new Complex({ re, im })', false],
      ['array', 'new Complex([re, im])', false],
      ['string', 'new Complex("re±im i")', false],
    ]);
  });

  it('builds the arguments through the entry asked for, and answers an error naming an entry it lacks', async () => {
    const target = complexJsTarget('complex.js', '2.4.3');
    // The string form and the object form both reach the method with the parts as written here.
    expect(
      await target.evaluate(
        'mul',
        [
          [
            [1, 2],
            [3, 4],
          ],
        ],
        'string',
      ),
    ).toEqual([{ value: [-5, 10] }]);
    expect(
      await target.evaluate(
        'mul',
        [
          [
            [1, 2],
            [3, 4],
          ],
        ],
        'object',
      ),
    ).toEqual([{ value: [-5, 10] }]);
    expect(await target.evaluate('sqrt', [[[4, 0]]], 'parser')).toEqual([
      { error: 'complex.js@2.4.3 has no entry "parser"; its entries are complex, object, array, string' },
    ]);
  });

  it.each(installed.map((t) => [t.name, t] as const))(
    '%s answers as the library does when called directly, on both sides of the cut',
    async (_name, descriptor) => {
      const mod = require(descriptor.settings.package as string) as ComplexJs & { default?: ComplexJs };
      const Complex = mod.default ?? mod;
      const points: ComplexPair[] = [
        [-4, -0],
        [-4, 0],
        [-2, 1e-300],
        [0.5, -0],
        [2, -0],
      ];
      for (const op of ['sqrt', 'log', 'asin', 'acos', 'atanh', 'acosh']) {
        const results = await descriptor.open().evaluate(
          op,
          points.map((p) => [p]),
        );
        const direct = points.map(([re, im]) => {
          const z = new Complex(re, im);
          const w = (z[op] as () => { re: number; im: number }).call(z);
          return { value: [w.re, w.im] };
        });
        expect({ op, results }).toEqual({ op, results: direct });
      }
    },
  );

  it('answers an error for a call with the wrong number of arguments and for an unknown op', async () => {
    const target = complexJsTarget('complex.js', '2.4.3');
    expect(await target.evaluate('pow', [[[1, 0]]])).toEqual([{ error: 'pow takes 2 argument(s), got 1' }]);
    expect(await target.supports('frobnicate')).toBe(false);
    expect(await target.evaluate('frobnicate', [[[1, 0]]])).toEqual([{ error: 'complex.js 2.4.3 has no frobnicate' }]);
  });
});
