import { formatPlaneNumber } from './format-plane-number';

/**
 * The two ends of an axis as text with as many significant digits as it takes to tell them
 * apart: a straddle's box around −0.5 of width 2e-3 reads "−0.5012 … −0.4988", not
 * "−0.5 … −0.5". Between 3 and 17 digits (17 tells any two doubles apart).
 */
export function formatAxisRange(min: number, max: number): [string, string] {
  const magnitude = Math.max(Math.abs(min), Math.abs(max));
  // Halves first, so the width of a box from −1e308 to 1e308 does not overflow.
  const width = max / 2 - min / 2;
  const needed = width > 0 && magnitude > 0 ? Math.ceil(Math.log10(magnitude / width)) + 2 : 3;
  for (let digits = Math.min(17, Math.max(3, needed)); digits <= 17; digits++) {
    const ends: [string, string] = [formatPlaneNumber(min, digits), formatPlaneNumber(max, digits)];
    if (ends[0] !== ends[1] || min === max) return ends;
  }
  return [formatPlaneNumber(min, 17), formatPlaneNumber(max, 17)];
}
