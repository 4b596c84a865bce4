/**
 * cos and sin of the angle 2π·u given in turns u, as [cos, sin].
 *
 * Why turns: a multiple of π is not a double, so Math.cos(Math.PI) gives −1 but
 * Math.sin(Math.PI) gives 1.2246467991473532e-16, and a circle point on the negative
 * real axis would land 1e-16 off it. In turns a quarter is 0.25, exactly.
 * The reduction is exact: r = u − ⌊u⌋ and f = r − k/4 are Sterbenz subtractions,
 * then |f| ≤ 1/8 turn goes to Math.cos/Math.sin (within about an ulp there).
 * Results are exact at every multiple of a quarter turn (0 and ±1) and give
 * √½ at odd eighths. Zeros come out +0; callers choose the sign.
 */
export function turnCosSin(u: number): [number, number] {
  if (!Number.isFinite(u)) throw new RangeError(`angle of ${u} turns is not finite`);
  let r = u - Math.floor(u);
  // u a tiny negative number: −1e-20 + 1 rounds to 1, which is the same angle as 0.
  if (r >= 1) r = 0;
  const quadrant = Math.floor(r * 4);
  const f = r - quadrant / 4;
  let c: number;
  let s: number;
  if (f === 0) {
    c = 1;
    s = 0;
  } else if (f === 0.125) {
    c = Math.SQRT1_2;
    s = Math.SQRT1_2;
  } else if (f < 0.125) {
    const a = 2 * Math.PI * f;
    c = Math.cos(a);
    s = Math.sin(a);
  } else {
    const a = 2 * Math.PI * (0.25 - f);
    c = Math.sin(a);
    s = Math.cos(a);
  }
  const rotated: [number, number] =
    quadrant === 0 ? [c, s] : quadrant === 1 ? [-s, c] : quadrant === 2 ? [-c, -s] : [s, -c];
  return [rotated[0] + 0, rotated[1] + 0];
}
