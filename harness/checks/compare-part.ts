import { ulpDistance } from '../reference/numbers/ulp-distance';
import type { PartComparison } from './part-comparison';

/** Compares one part sign-exactly: ulps apart, and whether a zero sign or finiteness differs. */
export function comparePart(actual: number, expected: number): PartComparison {
  const zeroSignDiffers = actual === 0 && expected === 0 && Object.is(actual, -0) !== Object.is(expected, -0);
  const finitenessDiffers =
    Number.isFinite(actual) !== Number.isFinite(expected) ||
    (!Number.isFinite(expected) && !(Object.is(actual, expected) || (Number.isNaN(actual) && Number.isNaN(expected))));
  return { ulps: finitenessDiffers ? Infinity : ulpDistance(actual, expected), zeroSignDiffers, finitenessDiffers };
}
