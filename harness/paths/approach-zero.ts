/**
 * The signed zero for a coordinate that is exactly zero at parameter t, chosen so the
 * point belongs to the side the path comes from: the one-sided limit t → t⁻, or
 * t → 0⁺ at the start. `derivative` is the coordinate's rate of change with t; when
 * it is zero (the path touches the axis and turns back) the path stays on the side
 * of `fallback`, whose sign (including a signed zero) is used.
 */
export function approachZero(t: number, derivative: number, fallback: number): number {
  let side: number;
  if (derivative !== 0 && !Number.isNaN(derivative)) side = t === 0 ? Math.sign(derivative) : -Math.sign(derivative);
  else side = Object.is(fallback, -0) || fallback < 0 ? -1 : 1;
  return side < 0 ? -0 : 0;
}
