const opposite = (a: number, e: number) => (a < 0 && e > 0) || (a > 0 && e < 0);

/**
 * Whether some part of a value is non-zero with the opposite sign to the same part of the other
 * (zeros are neither sign here). Compared, not multiplied: 5e−324 · −1e−300 underflows to −0.
 */
export function oppositeSign(ar: number, ai: number, er: number, ei: number): boolean {
  return opposite(ar, er) || opposite(ai, ei);
}
