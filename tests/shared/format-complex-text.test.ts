import fc from 'fast-check';
import { formatComplexText } from '../../shared/format-complex-text';
import { wireDouble } from '../../shared/wire-double';
import { formatDouble } from '../../harness/reference/numbers/format-double';

/** Reads "re ± im i" back into its two wire parts, accepting either minus sign and either unit. */
function readBack(text: string): [string, string] {
  const m = /^([−-]?)(\S+) ([+−-]) (\S+?)(?:\*i|·i|i)$/u.exec(text);
  if (!m) throw new Error(`not complex text: ${JSON.stringify(text)}`);
  return [`${m[1] ? '-' : ''}${m[2]}`, `${m[3] === '+' ? '' : '-'}${m[4]}`];
}

/** Same bits, NaN for NaN (a wire "nan" carries no payload). */
const sameDouble = (a: number, b: number) => Object.is(a, b);

describe('formatComplexText', () => {
  it('returns −0 − 2i for −0 − 2i and 0 + 2i for +0 + 2i', () => {
    expect(formatComplexText({ re: '-0', im: '-2' })).toBe('−0 − 2i');
    expect(formatComplexText({ re: '0', im: '2' })).toBe('0 + 2i');
  });

  it('returns 0 − 0i for +0 − 0i and −0 + 0i for −0 + 0i', () => {
    expect(formatComplexText({ re: '0', im: '-0' })).toBe('0 − 0i');
    expect(formatComplexText({ re: '-0', im: '0' })).toBe('−0 + 0i');
  });

  it('writes one U+2212 minus per negative part and no hyphen as a sign', () => {
    const text = formatComplexText({ re: '-1.5', im: '-2.5e-300' });
    expect(text).toBe('−1.5 − 2.5e-300i');
    expect(text.startsWith('-')).toBe(false);
  });

  it('returns -0 - 2i and -inf + nan*i with ascii signs', () => {
    expect(formatComplexText({ re: '-0', im: '-2' }, { ascii: true })).toBe('-0 - 2i');
    expect(formatComplexText({ re: '-inf', im: 'nan' }, { ascii: true })).toBe('-inf + nan*i');
  });

  it('spells infinities and NaN as the wire does, with ·i after a word', () => {
    expect(formatComplexText({ re: 'inf', im: '-inf' })).toBe('inf − inf·i');
    expect(formatComplexText({ re: 'nan', im: 'nan' })).toBe('nan + nan·i');
  });

  it('reads suite text with one sign per part: "+2" as 2, a ratio and a multiple of π with ·i', () => {
    expect(formatComplexText({ re: '+2', im: '+3' })).toBe('2 + 3i');
    expect(formatComplexText({ re: '1/3', im: '-3pi/4' })).toBe('1/3 − 3pi/4·i');
  });

  it('returns a dash for a missing value', () => {
    expect(formatComplexText(null)).toBe('—');
    expect(formatComplexText(undefined, { ascii: true })).toBe('—');
  });

  it('reads back to the same two doubles for every pair of doubles, ±0, ±inf, nan and subnormals included, in both sign styles (seed 2212)', () => {
    const special = fc.constantFrom(
      0,
      -0,
      Infinity,
      -Infinity,
      NaN,
      Number.MIN_VALUE,
      -Number.MIN_VALUE,
      2.2250738585072009e-308,
    );
    const anyDouble = fc.oneof(fc.double(), special);
    fc.assert(
      fc.property(anyDouble, anyDouble, fc.boolean(), (re, im, ascii) => {
        const text = formatComplexText({ re: formatDouble(re), im: formatDouble(im) }, { ascii });
        const [r, i] = readBack(text);
        return sameDouble(wireDouble(r), re) && sameDouble(wireDouble(i), im);
      }),
      { seed: 2212, numRuns: 20_000 },
    );
  });
});
