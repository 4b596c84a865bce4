import { spawnSync } from 'node:child_process';
import { Decimal } from 'decimal.js';
import fc from 'fast-check';
import { BigFloat } from '../../../../harness/reference/numbers/big-float';
import { bitLength } from '../../../../harness/reference/numbers/bit-length';
import { formatDouble } from '../../../../harness/reference/numbers/format-double';
import { parseDouble } from '../../../../harness/reference/numbers/parse-double';
import { parseNumber } from '../../../../harness/reference/numbers/parse-number';
import { cpuMilliseconds } from '../../../../scripts/reference-sweep/cpu-milliseconds';
import { Rational } from '../../../../harness/reference/numbers/rational';
import { ulpDistance } from '../../../../harness/reference/numbers/ulp-distance';

const two = (k: number) => BigFloat.of(false, 1n, k);

describe('BigFloat', () => {
  it('holds the exact value of the double 0.1, 3602879701896397/2^55', () => {
    // IEEE 754 binary64: 0.1 rounds to 0x1.999999999999ap-4 (common practice, checkable with float.hex).
    const b = BigFloat.fromDouble(0.1);
    expect(new Rational(b.m, 1n << BigInt(-b.e)).toString()).toBe(`3602879701896397/${1n << 55n}`);
    expect(b.toDecimal(40)).toBe('0.1000000000000000055511151231257827021182');
  });

  it('keeps the sign of −0 and the smallest subnormal 2^−1074 exactly', () => {
    expect(Object.is(BigFloat.fromDouble(-0).toDouble(), -0)).toBe(true);
    const tiny = BigFloat.fromDouble(5e-324);
    expect([tiny.m, tiny.e]).toEqual([1n, -1074]);
  });

  it('rounds to nearest with ties to even, as IEEE 754 roundTiesToEven', () => {
    // 1 + 2^−53 is halfway between 1 and 1 + 2^−52: ties go to the even significand, 1.
    expect(BigFloat.ONE.add(two(-53)).toDouble()).toBe(1);
    // 1 + 3·2^−53 is halfway between 1 + 2^−52 and 1 + 2^−51: the even one is 1 + 2^−51.
    expect(BigFloat.ONE.add(BigFloat.of(false, 3n, -53)).toDouble()).toBe(1 + 2 ** -51);
    expect(BigFloat.ONE.add(two(-53)).add(two(-200)).toDouble()).toBe(1 + 2 ** -52);
  });

  it('underflows gradually: 2^−1075 rounds to +0 (tie to even) and 3·2^−1076 to 2^−1074', () => {
    expect(Object.is(two(-1075).toDouble(), 0)).toBe(true);
    expect(Object.is(two(-1075).negate().toDouble(), -0)).toBe(true);
    expect(BigFloat.of(false, 3n, -1076).toDouble()).toBe(5e-324);
  });

  it('overflows to ∞ exactly at the rounding threshold (2^1024 − 2^970)', () => {
    // IEEE 754: values ≥ 2^1024 − 2^970 round to infinity under roundTiesToEven.
    const threshold = two(1024).sub(two(970));
    expect(threshold.toDouble()).toBe(Infinity);
    expect(threshold.sub(two(900)).toDouble()).toBe(Number.MAX_VALUE);
  });

  it('gives exact sums with IEEE zero signs: x − x = +0, −0 + −0 = −0', () => {
    const x = BigFloat.fromDouble(1.5);
    expect(Object.is(x.sub(x).toDouble(), 0)).toBe(true);
    expect(Object.is(BigFloat.NEG_ZERO.add(BigFloat.NEG_ZERO).toDouble(), -0)).toBe(true);
    expect(BigFloat.fromDouble(1e300).add(BigFloat.fromDouble(1e-300)).sub(BigFloat.fromDouble(1e300)).toDouble()).toBe(
      1e-300,
    );
  });

  it('takes square roots to the requested bits: √2 to 40 digits, √6.25 = 2.5 exactly', () => {
    // √2 = 1.41421356237309504880168872420969807856967… (common knowledge; also DLMF-independent: squared below).
    const root = BigFloat.fromDouble(2).sqrt(140);
    expect(root.toDecimal(40)).toBe('1.41421356237309504880168872420969807857');
    expect(
      root
        .mul(root)
        .sub(BigFloat.fromDouble(2))
        .abs()
        .compare(BigFloat.of(false, 1n, -138)),
    ).toBeLessThan(0);
    expect(BigFloat.fromDouble(6.25).sqrt(60).toDouble()).toBe(2.5);
  });

  // Law: the root r = m·2^e that sqrt(bits) returns for n is the floor of √n at its last bit,
  // r² ≤ n < (r + 2^e)², with at least `bits` bits; for every size of n, and at the squares of
  // 2^k ± 1 and of all-ones roots, where an estimate one off shows. Seed printed on failure.
  it('truncates square roots exactly: r² ≤ n < (r + ulp)² for integers of 1 to 1,400 bits', () => {
    const SEED = 20261205;
    const near = fc.tuple(fc.integer({ min: 1, max: 700 }), fc.integer({ min: -1, max: 1 })).map(([k, d]) => {
      const root = (1n << BigInt(k)) + BigInt(d);
      return [root * root + BigInt(d), root * root - 1n, root * root];
    });
    const any = fc.bigInt({ min: 1n, max: 1n << 1400n }).map((n) => [n]);
    fc.assert(
      fc.property(fc.oneof(near, any), fc.integer({ min: 1, max: 800 }), (ns, bits) => {
        for (const n of ns) {
          if (n <= 0n) continue;
          const r = BigFloat.fromBigInt(n).sqrt(bits);
          expect(r.m.toString(2).length).toBeGreaterThanOrEqual(bits);
          const shift = BigInt(-2 * r.e);
          const square = r.m * r.m;
          const next = (r.m + 1n) * (r.m + 1n);
          // e ≤ 0 here (bits ≥ 1 and the root keeps them), so compare n·2^(−2e) with the squares.
          expect(r.e).toBeLessThanOrEqual(0);
          expect(square <= n << shift && n << shift < next).toBe(true);
        }
      }),
      { seed: SEED, numRuns: 600 },
    );
  });

  // Law: toDecimal(d) is the exact value m·2^e rounded half-up to d significant digits, the same
  // number decimal.js (an independent decimal library, at 2,000 digits) gives for it.
  it('prints d significant digits of the exact value, rounded half-up, at every scale', () => {
    const Exact = Decimal.clone({ precision: 2000 });
    fc.assert(
      fc.property(
        fc.bigInt({ min: 1n, max: 1n << 300n }),
        fc.integer({ min: -1200, max: 1000 }),
        fc.boolean(),
        fc.integer({ min: 1, max: 60 }),
        (m, e, neg, digits) => {
          const value = BigFloat.of(neg, m, e);
          const exact = new Exact(m.toString()).times(new Exact(2).pow(e)).times(neg ? -1 : 1);
          const expected = exact.toSignificantDigits(digits, Decimal.ROUND_HALF_UP);
          return new Exact(value.toDecimal(digits)).eq(expected);
        },
      ),
      { seed: 20261205, numRuns: 3000 },
    );
  });

  // Law: bitLength(m) is the length of m's binary digits; Number(m) rounding up to a power of
  // two (m = 2^k − 1 for k > 53) is the case the exponent alone gets wrong.
  it('counts the bits of a bigint, also just below and at powers of two', () => {
    for (let k = 1; k <= 1100; k++) {
      for (const m of [(1n << BigInt(k)) - 1n, 1n << BigInt(k), (1n << BigInt(k)) + 1n]) {
        expect([k, bitLength(m)]).toEqual([k, m.toString(2).length]);
      }
    }
    fc.assert(
      fc.property(fc.bigInt({ min: 1n, max: 1n << 2000n }), (m) => bitLength(m) === m.toString(2).length),
      { seed: 20261205, numRuns: 2000 },
    );
  });
});

describe('number parsing and formatting', () => {
  it('reads a decimal string as the nearest double and "-0", "inf", "nan", hex floats as such', () => {
    expect(parseDouble('0.1')).toBe(0.1);
    expect(Object.is(parseDouble('-0'), -0)).toBe(true);
    expect(parseDouble('-0x1.8p+1')).toBe(-3);
    expect(parseDouble('-inf')).toBe(-Infinity);
    expect(parseDouble('nan')).toBeNaN();
    expect(parseDouble('2.4703282292062328e-324')).toBe(5e-324);
  });

  it('rounds a ratio p/q to the nearest double: 1/3 is 0x1.5555555555555p-2', () => {
    expect(parseDouble('1/3')).toBe(1 / 3);
    expect(parseDouble('2/3')).toBe(2 / 3);
  });

  it('keeps decimals and ratios exact where the wire says they are exact', () => {
    const tenth = parseNumber('0.1');
    expect(tenth.kind === 'exact' && tenth.value.compare(new Rational(1n, 10n))).toBe(0);
    const third = parseNumber('1/3');
    expect(third.kind === 'exact' && third.value.toString()).toBe('1/3');
  });

  it('refuses text that is not a number, naming it', () => {
    expect(() => parseNumber('1e')).toThrow('"1e" is not a number');
    expect(() => parseNumber('')).toThrow('is not a number');
    expect(() => parseNumber('1/0')).toThrow('zero denominator');
  });

  it('writes doubles as the shortest round-trip decimal with -0, inf and nan', () => {
    expect([0.1, -0, Infinity, -Infinity, NaN, 1e-300].map(formatDouble)).toEqual([
      '0.1',
      '-0',
      'inf',
      '-inf',
      'nan',
      '1e-300',
    ]);
  });
});

describe('ulpDistance', () => {
  it('counts the doubles between two values, across zero and into the subnormals', () => {
    expect(ulpDistance(1, 1 + 2 ** -52)).toBe(1);
    expect(ulpDistance(-5e-324, 5e-324)).toBe(2);
    expect(ulpDistance(0, -0)).toBe(0);
    expect(ulpDistance(Number.MAX_VALUE, Infinity)).toBe(1);
    expect(ulpDistance(NaN, 1)).toBe(Infinity);
    expect(ulpDistance(NaN, NaN)).toBe(0);
  });
});

describe('BigFloat.toDecimal far beyond the doubles', () => {
  // Python's decimal module (Debian's /usr/bin/python3), 80 digits, ROUND_HALF_UP to 40: m·2^e
  // there is exact to 80 digits, so its 40 are the true value's.
  const cases: [bigint, number][] = [
    [12345678901234567n, 3000],
    [98765432123456789n, -5000],
    [3n, 100000],
    [7n, -954000],
    [(1n << 200n) + 1n, -60000],
    [9007199254740991n, 1100000],
  ];
  it('prints the same 40 digits as an exact decimal computation, and quickly', () => {
    const script = [
      'import sys, json',
      'from decimal import Decimal, getcontext, ROUND_HALF_UP',
      'getcontext().prec = 80',
      'getcontext().Emax = 10**9; getcontext().Emin = -10**9',
      'out = []',
      'for m, e in json.load(sys.stdin):',
      '    v = Decimal(m) * (Decimal(2) ** e)',
      "    out.append('{:.39e}'.format(v.quantize(Decimal(1).scaleb(v.adjusted() - 39), rounding=ROUND_HALF_UP)))",
      'print(json.dumps(out))',
    ].join('\n');
    const run = spawnSync('/usr/bin/python3', ['-c', script], {
      input: JSON.stringify(cases.map(([m, e]) => [m.toString(), e])),
      encoding: 'utf8',
    });
    const expected = JSON.parse(run.stdout) as string[];
    cases.forEach(([m, e], i) => {
      let ours = '';
      expect(cpuMilliseconds(() => (ours = BigFloat.of(false, m, e).toDecimal(40)))).toBeLessThan(50);
      // Same digits (ours drops trailing zeros) and the same power of ten.
      const [digits, power] = (expected[i] as string).split('e');
      const [ourDigits, ourPower] = ours.split('e');
      expect(ourDigits).toBe((digits as string).replace(/\.?0+$/, ''));
      expect(Number(ourPower)).toBe(Number(power));
    });
  });
});

describe('BigFloat.toDouble below the subnormals', () => {
  it('rounds to a signed zero below half the least subnormal and to it at three quarters of it', () => {
    // IEEE 754-2019 §4.3.1 roundTiesToEven with gradual underflow: 2^−1075 is the midpoint between
    // +0 and 2^−1074 and goes to +0 (even); 3·2^−1076 goes to 2^−1074.
    expect(Object.is(BigFloat.of(true, 1n, -(2 ** 42)).toDouble(), -0)).toBe(true);
    expect(Object.is(BigFloat.of(false, 1n, -1075).toDouble(), 0)).toBe(true);
    expect(BigFloat.of(false, 3n, -1076).toDouble()).toBe(Number.MIN_VALUE);
  });
});
