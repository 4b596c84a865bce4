/** Where cmath raises, the value C returns (ISO/IEC 9899:2011 clause beside each; G.6.3.1–2 and G.6.2.3 read in the C99 text). */
export const C_RULE: Record<string, (x: number, y: number) => [number, number] | undefined> = {
  // G.6.3.2: clog(−0 + i0) = −∞ + iπ, clog(+0 + i0) = −∞ + i0; conjugate symmetric.
  log: (x, y) => (x === 0 && y === 0 ? [-Infinity, Object.is(x, -0) ? Math.sign(1 / y) * Math.PI : y] : undefined),
  // G.6.2.3: catanh(+1 + i0) = +∞ + i0; odd and conjugate symmetric.
  atanh: (x, y) => (Math.abs(x) === 1 && y === 0 ? [x * Infinity, y] : undefined),
  // G.6.3.1: cexp(x + i∞) = NaN + iNaN for finite x (invalid); cexp(+∞ ± i∞) = ±∞ + iNaN.
  exp: (x, y) => (Math.abs(y) === Infinity ? (x === Infinity ? [Infinity, NaN] : [NaN, NaN]) : undefined),
  // catan z = −i catanh(iz): catan(±0 ± i) is −i·catanh(∓1 ± 0i) = ±0 ± i∞.
  atan: (x, y) => (x === 0 && Math.abs(y) === 1 ? [x, y * Infinity] : undefined),
};
