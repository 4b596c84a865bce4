import { geometryNumber } from '../../../harness/paths/geometry-number';

// Round-to-nearest-even decimal conversion is common practice (IEEE 754, ECMA-262); the clause numbers below were not checked against the standards' text.
describe('geometryNumber', () => {
  it('reads "-0" as −0 and "0" as +0', () => {
    expect(Object.is(geometryNumber('-0'), -0)).toBe(true);
    expect(Object.is(geometryNumber('0'), 0)).toBe(true);
  });

  it('reads a decimal string as the nearest double', () => {
    // IEEE 754-2008 §5.12.2: conversion from decimal character sequences is correctly rounded.
    expect(geometryNumber('0.1')).toBe(0.1);
    // 2^53 + 1 lies halfway between 2^53 and 2^53 + 2: ties go to the even significand (IEEE 754 roundTiesToEven).
    expect(geometryNumber('9007199254740993')).toBe(9007199254740992);
    // 2^53 + 3 lies halfway between 2^53 + 2 and 2^53 + 4: the even one is 2^53 + 4.
    expect(geometryNumber('9007199254740995')).toBe(9007199254740996);
    // A digit past the halfway point decides the rounding however far out it is written.
    expect(geometryNumber('9007199254740993.0000000000000000000001')).toBe(9007199254740994);
    // The least subnormal, 2^-1074 (IEEE 754 binary64).
    expect(geometryNumber('4.9406564584124654e-324')).toBe(2 ** -1074);
    expect(geometryNumber('5e-324')).toBe(2 ** -1074);
  });

  it('reads a C hex float exactly and a ratio p/q as the nearest double', () => {
    // ISO/IEC 9899:2011 6.4.4.2: 0x1.8p+1 is 1.5 · 2^1 = 3; 0x1p-1074 is the least subnormal.
    expect(geometryNumber('0x1.8p+1')).toBe(3);
    expect(geometryNumber('-0x1p-1074')).toBe(-(2 ** -1074));
    // 1/3 in JavaScript is the correctly rounded quotient (IEEE 754 division), the nearest double to ⅓.
    expect(geometryNumber('1/3')).toBe(1 / 3);
    expect(geometryNumber('-2/4')).toBe(-0.5);
  });

  it('refuses Infinity, empty and other text that Number() accepts or turns into 0', () => {
    for (const text of ['Infinity', 'inf', 'nan', '', '  ', '1e999', 'pi', '0b101', '1/0']) {
      expect(() => geometryNumber(text)).toThrow(RangeError);
    }
  });

  it('refuses non-finite numbers', () => {
    expect(() => geometryNumber(NaN)).toThrow(RangeError);
    expect(() => geometryNumber(-Infinity)).toThrow(RangeError);
  });
});
