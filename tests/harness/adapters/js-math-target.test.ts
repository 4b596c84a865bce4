import { jsMathTarget } from '../../../harness/adapters/js-math-target';

// IEEE 754 and ECMA-262 clause numbers below were not checked against the standards' text.
describe('jsMathTarget', () => {
  const target = jsMathTarget();

  it('names itself after the Node version it runs in', () => {
    expect(target.name).toBe(`js-math@${process.versions.node}`);
    expect(target.settings.v8).toBe(process.versions.v8);
  });

  it('returns IEEE 754 special values: sqrt(−0) = −0, log(+0) = −∞, atanh(1) = +∞, sqrt(−4) = NaN', async () => {
    // IEEE 754-2019 §5.4.1: squareRoot(−0) is −0; ECMA-262 Math.sqrt, Math.log, Math.atanh
    // (§21.3.2): log(+0) is −∞, atanh(1) is +∞, sqrt of a negative number is NaN.
    const results = await Promise.all([
      target.evaluate('sqrt', [[[-0, 0]], [[-4, 0]]]),
      target.evaluate('log', [[[0, 0]]]),
      target.evaluate('atanh', [[[1, -0]]]),
    ]);
    expect(results).toEqual([
      [{ value: [-0, 0] }, { value: [NaN, 0] }],
      [{ value: [-Infinity, 0] }],
      [{ value: [Infinity, 0] }],
    ]);
  });

  it('refuses an argument off the real line with an error result', async () => {
    expect(await target.evaluate('sqrt', [[[-4, 1]], [[4, 0]]])).toEqual([
      { error: 'a real-line target takes real arguments, got imaginary part 1' },
      { value: [2, 0] },
    ]);
  });

  it('reports nthroot and the reciprocal functions as unsupported', async () => {
    for (const op of ['nthroot', 'acot', 'asec', 'acsch']) expect(await target.supports(op)).toBe(false);
    expect(await target.supports('cbrt')).toBe(true);
    expect(await target.evaluate('acot', [[[1, 0]]])).toEqual([{ error: 'Math has no acot' }]);
  });

  it('computes pow(−8, 1/3) as NaN: Math.pow has no real cube root of a negative base', async () => {
    // ECMA-262 Number::exponentiate: a finite negative base with a non-integer exponent gives NaN.
    expect(
      await target.evaluate('pow', [
        [
          [-8, 0],
          [1 / 3, 0],
        ],
      ]),
    ).toEqual([{ value: [NaN, 0] }]);
    expect(await target.evaluate('cbrt', [[[-8, 0]]])).toEqual([{ value: [-2, 0] }]);
  });
});
