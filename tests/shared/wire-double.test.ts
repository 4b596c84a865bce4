import fc from 'fast-check';
import { parseDouble } from '../../harness/reference/numbers/parse-double';
import { wireDouble } from '../../shared/wire-double';

const SEED = 20261205;

describe('wireDouble', () => {
  it('reads every kind of wire number as the reference engine’s parseDouble does, bit for bit', () => {
    // Law: wireDouble(s) and parseDouble(s) are the same double (−0 and NaN included) for every
    // decimal, hex float and ratio, from 0 through the subnormals to past the largest double.
    const digits = (chars: string, max: number) =>
      fc.string({ unit: fc.constantFrom(...chars.split('')), minLength: 1, maxLength: max });
    const sign = fc.constantFrom('', '-', '+');
    const decimal = fc
      .tuple(sign, digits('0123456789', 20), fc.option(digits('0123456789', 20)), fc.integer({ min: -400, max: 400 }))
      .map(([s, w, f, e]) => `${s}${w}${f === null ? '' : `.${f}`}e${e}`);
    const hex = fc
      .tuple(
        sign,
        digits('0123456789abcdef', 16),
        fc.option(digits('0123456789abcdef', 16)),
        fc.integer({ min: -1200, max: 1100 }),
      )
      .map(([s, w, f, e]) => `${s}0x${w}${f === null ? '' : `.${f}`}p${e}`);
    const big = fc.bigInt({ min: 0n, max: 1n << 1200n });
    const ratio = fc
      .tuple(
        sign.filter((s) => s !== '+'),
        fc.oneof(big, fc.bigInt({ min: 0n, max: 1000n })),
        fc.oneof(big, fc.bigInt({ min: 1n, max: 1000n })),
      )
      .filter(([, , q]) => q > 0n)
      .map(([s, p, q]) => `${s}${p}/${q}`);
    fc.assert(
      fc.property(fc.oneof(decimal, hex, ratio), (text) => Object.is(wireDouble(text), parseDouble(text))),
      { seed: SEED, numRuns: 2000, verbose: true },
    );
  });

  it('rounds the halfway cases and the edges of the subnormals as the reference engine does', () => {
    const edges = [
      '0x1p-1074',
      '0x1p-1075',
      '0x1.0000000000001p-1075',
      '0x3p-1076',
      '0x1.fffffffffffff8p1023',
      '0x1.fffffffffffff7p1023',
      '1/3',
      '-1/3',
      '2/3',
      '0/7',
      '-0/7',
      '1/' + '9'.repeat(330),
      '9'.repeat(320) + '/1',
      '0x1.00000000000008p0',
      '0x1.00000000000018p0',
      '-0',
      '-0x0p0',
      'inf',
      '-inf',
      'nan',
      'Infinity',
      '+inf',
    ];
    for (const text of edges) expect([text, wireDouble(text)]).toEqual([text, parseDouble(text)]);
  });

  it('reads a ratio over 0 and text that is no number as NaN', () => {
    expect(wireDouble('1/0')).toBeNaN();
    expect(wireDouble('one')).toBeNaN();
    expect(wireDouble('')).toBeNaN();
  });
});
