import { formatHexDouble } from '../../../harness/checks/format-hex-double';
import { ulpsApart } from '../../../harness/checks/ulps-apart';
import { parseDouble } from '../../../harness/reference/numbers/parse-double';
import { ulpDistance } from '../../../harness/reference/numbers/ulp-distance';

describe('formatHexDouble', () => {
  it('writes C99 hex floats that read back to the same bits, zero signs and subnormals included', () => {
    expect(formatHexDouble(-3)).toBe('-0x1.8p+1');
    expect(formatHexDouble(-0)).toBe('-0x0p+0');
    expect(formatHexDouble(0)).toBe('0x0p+0');
    expect(formatHexDouble(5e-324)).toBe('0x0.0000000000001p-1022');
    expect(formatHexDouble(Infinity)).toBe('inf');
    for (const x of [0.1, -1e-300, 1.7976931348623157e308, 2.2250738585072014e-308, -5e-324, Math.PI])
      expect(Object.is(parseDouble(formatHexDouble(x)), x)).toBe(true);
  });
});

describe('ulpsApart', () => {
  it('counts the doubles between two values exactly as the BigInt ulpDistance does', () => {
    const pairs: [number, number][] = [
      [1, 1 + 2 ** -52],
      [1, 1 - 2 ** -53],
      [-0, 0],
      [5e-324, -5e-324],
      [1e-310, 1.0000001e-310],
      [2, 1.9999999999999],
      [-2, -2.0000000000001],
    ];
    for (const [a, b] of pairs) expect(ulpsApart(a, b)).toBe(ulpDistance(a, b));
  });
});
