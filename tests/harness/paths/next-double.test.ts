import { nextDouble } from '../../../harness/paths/next-double';

describe('nextDouble', () => {
  it('steps from 1 by one ulp up (2^-52) and one ulp down (2^-53)', () => {
    // binary64 has 52 fraction bits: the spacing is 2^-52 in [1, 2) and 2^-53 in [½, 1).
    expect(nextDouble(1, 1)).toBe(1 + 2 ** -52);
    expect(nextDouble(1, -1)).toBe(1 - 2 ** -53);
  });

  it('steps from either zero to the least subnormal of that direction', () => {
    expect(nextDouble(0, 1)).toBe(2 ** -1074);
    expect(nextDouble(-0, -1)).toBe(-(2 ** -1074));
  });

  it('steps across negative numbers in the right direction', () => {
    expect(nextDouble(-1, 1)).toBe(-1 + 2 ** -53);
    expect(nextDouble(-1, -1)).toBe(-1 - 2 ** -52);
    // The bit pattern one below −2^-1074 is −0, which is where the step lands.
    expect(nextDouble(-(2 ** -1074), 1)).toBe(-0);
  });

  it('steps from the largest double to infinity', () => {
    expect(nextDouble(Number.MAX_VALUE, 1)).toBe(Infinity);
  });
});
