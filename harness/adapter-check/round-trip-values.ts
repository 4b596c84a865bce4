/**
 * The numbers the round-trip check sends (docs/adapter-check.md), each pair named by what it tests.
 * The expected double of every string is the harness's own reading of it (parse-double.ts: nearest
 * double, ties to even, hex floats exact), which is what the stdio protocol asks of a program.
 * CPython's float() and float.fromhex, correctly rounded, read every one to the same double: the
 * cmath adapter's run in tests/harness/adapter-check/run-adapter-checks.test.ts passes this check.
 */
export const ROUND_TRIP_VALUES: readonly { what: string; pair: readonly [string, string] }[] = [
  { what: '−0 in both parts', pair: ['-0', '-0'] },
  { what: '−0 in the real part', pair: ['-0', '0'] },
  { what: '−0 in the imaginary part', pair: ['0', '-0'] },
  { what: '−0 written -0.0', pair: ['-0.0', '1'] },
  { what: 'the smallest subnormals ±5e−324', pair: ['5e-324', '-5e-324'] },
  {
    what: 'the largest subnormal and the smallest normal',
    pair: ['2.225073858507201e-308', '2.2250738585072014e-308'],
  },
  { what: '±inf', pair: ['inf', '-inf'] },
  { what: 'nan beside a number', pair: ['nan', '-1.5'] },
  { what: 'hex floats 0x1p-1074 and -0x1.8p+1', pair: ['0x1p-1074', '-0x1.8p+1'] },
  { what: 'hex floats at the top of the range', pair: ['0x1.fffffffffffffp+1023', '-0x1p-1022'] },
  { what: '17-digit decimals', pair: ['0.30000000000000004', '-1.7976931348623157e308'] },
  { what: '17-digit decimals one ulp from 1', pair: ['1.0000000000000002', '0.99999999999999989'] },
  // 2^53 + 1 lies halfway between two doubles; ties to even gives 2^53.
  { what: 'a decimal halfway between two doubles (ties to even)', pair: ['9007199254740993', '-9007199254740993'] },
];
