import type { ReferenceAnswer } from '../../shared/reference-answer';
import { wireDouble } from '../../shared/wire-double';
import { askPython, type OraclePoint } from '../../tests/external/python-oracle';
import { unhex } from '../../tests/external/unhex';
import type { SweepInput } from './sweep-inputs';

/** How a sample of the sweep compared with mpmath, and the first disagreements. */
export interface MpmathAgreement {
  compared: number;
  agreed: number;
  disagreements: { input: SweepInput; ours: [string, string]; mpmath: [string, string] }[];
}

const SHOWN = 10;

/**
 * Compares up to `size` answers of the sweep, bit for bit, with mpmath (Debian's python3-mpmath
 * through /usr/bin/python3, 60 digits on at least 720 working digits, tests/external/python/oracle.py),
 * each part rounded to nearest-even from mpmath's binary value by the oracle itself, since
 * mpmath's float() rounds twice in the subnormal range. The sample is every k-th input off the
 * axes (both parts of z non-zero): mpmath has no signed zeros, so on the cuts its side is neither
 * convention's; the axes and their zero signs are checked against Annex G and cmath elsewhere
 * (tests/external/cmath-annex-g.test.ts). A part that mpmath makes exactly zero is compared
 * without its sign, for the same reason. Both sides round values that are not midpoints, and
 * mpmath's 2,390-bit value is within 2^−2,300 relative of the true one, so a disagreement means a
 * wrong bit on our side unless a true value lies that close to a midpoint.
 */
export function compareWithMpmath(
  inputs: readonly SweepInput[],
  answers: readonly ReferenceAnswer[],
  size: number,
): MpmathAgreement {
  const offAxis = inputs
    .map((input, i) => ({ input, answer: answers[i] as ReferenceAnswer }))
    .filter(({ input }) => input.z.re !== '0' && input.z.re !== '-0' && input.z.im !== '0' && input.z.im !== '-0');
  const step = Math.max(1, Math.floor(offAxis.length / size));
  const sample = offAxis.filter((_, i) => i % step === 0).slice(0, size);
  const points: OraclePoint[] = sample.map(({ input }) => ({
    fn: input.fn,
    z: [input.z.re, input.z.im],
    ...(input.w === undefined ? {} : { w: typeof input.w === 'string' ? input.w : [input.w.re, input.w.im] }),
    ...(input.n === undefined ? {} : { n: input.n }),
    work_dps: workingDigits(input),
  }));
  const theirs = askPython<{ re_rounded: string; im_rounded: string }>('mpmath', points);
  const result: MpmathAgreement = { compared: sample.length, agreed: 0, disagreements: [] };
  sample.forEach(({ input, answer }, i) => {
    const m = theirs[i] as { re_rounded: string; im_rounded: string };
    const expected: [number, number] = [unhex(m.re_rounded), unhex(m.im_rounded)];
    const ours: [string, string] = 'error' in answer ? ['error', 'error'] : [answer.double.re, answer.double.im];
    const same = ours.every((part, k) => samePart(wireDouble(part), expected[k] as number));
    if (same) result.agreed += 1;
    else if (result.disagreements.length < SHOWN) {
      result.disagreements.push({ input, ours, mpmath: [String(expected[0]), String(expected[1])] });
    }
  });
  return result;
}

/**
 * mpmath's working digits for a point: the oracle's 720, plus twice the decimal orders of magnitude
 * between the parts of z. 1/z (the reciprocal functions) and z² (inside asin, acos …) put the
 * smaller part that many orders further below the larger one, and at 720 digits mpmath lost the
 * imaginary part of asech(−1.57e308 + 6.4e−288i)'s 1/z, and with it the side of the cut.
 */
function workingDigits(input: SweepInput): number {
  const orders = Math.abs(Math.log10(Math.abs(Number(input.z.re))) - Math.log10(Math.abs(Number(input.z.im))));
  return 720 + 2 * Math.ceil(orders);
}

/** Bit-for-bit, except that mpmath's unsigned zero matches either of ours. */
function samePart(ours: number, mpmath: number): boolean {
  if (mpmath === 0) return ours === 0;
  return Object.is(ours, mpmath);
}
