import type { ComplexDouble } from './complex-double';
import { detectJumps } from './detect-jumps';
import { sheetFactor } from './other-sheets';

const div = (a: ComplexDouble, b: ComplexDouble): ComplexDouble => {
  const m = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / m, (a[1] * b[0] - a[0] * b[1]) / m];
};
const mul = (a: ComplexDouble, b: ComplexDouble): ComplexDouble => [
  a[0] * b[0] - a[1] * b[1],
  a[0] * b[1] + a[1] * b[0],
];
/** A jump factor must be this close (relative) to some e^{2πiνk} to be read as that sheet change. */
const SNAP = 0.1;
const MAX_K = 64;

/**
 * The monodromy a library's values imply along a closed path, for a function that should be
 * a branch of g(z)^ν: the values are followed around the path, and at each of their own jumps
 * (detectJumps) the jump — the step's ratio divided by the neighbouring step's ratio, which
 * removes the continuous change — is read as the nearest factor e^{2πiνk}. The continued
 * function then comes back multiplied by (v_end / v_start) / Π e^{2πiνk}: the monodromy the
 * library's branch structure implies, to compare with the continuation engine's. A jump that
 * is no e^{2πiνk}, or a missing value, makes the factor unreadable, and the note says where.
 */
export function libraryMonodromy(
  t: readonly number[],
  values: readonly (ComplexDouble | null)[],
  nu: readonly [number, number],
): { factor: ComplexDouble; jumps: number } | { note: string } {
  const n = values.length;
  const missing = values.findIndex((v) => !v || !v.every(Number.isFinite) || (v[0] === 0 && v[1] === 0));
  if (missing >= 0) return { note: `no usable library value at t = ${t[missing]}` };
  const v = values as readonly ComplexDouble[];
  const jumps = detectJumps(v);
  let total: ComplexDouble = [1, 0];
  let count = 0;
  for (let i = 0; i + 1 < n; i++) {
    if (!jumps[i]) continue;
    const ratio = div(v[i + 1] as ComplexDouble, v[i] as ComplexDouble);
    const before = i >= 1 && !jumps[i - 1] ? div(v[i] as ComplexDouble, v[i - 1] as ComplexDouble) : null;
    const after = i + 2 < n && !jumps[i + 1] ? div(v[i + 2] as ComplexDouble, v[i + 1] as ComplexDouble) : null;
    const smooth = before ?? after ?? [1, 0];
    const jump = div(ratio, smooth);
    let best = { k: 0, distance: Infinity, factor: [1, 0] as ComplexDouble };
    for (let k = -MAX_K; k <= MAX_K; k++) {
      const f = sheetFactor(nu, k);
      const distance = Math.hypot(jump[0] - f[0], jump[1] - f[1]) / Math.hypot(f[0], f[1]);
      if (distance < best.distance) best = { k, distance, factor: f };
    }
    if (best.distance > SNAP) {
      return {
        note: `the library jumps at t ≈ ${(t[i]! + t[i + 1]!) / 2} by a factor ${jump[0].toPrecision(6)} + ${jump[1].toPrecision(6)}i, which is no e^{2πiνk}`,
      };
    }
    total = mul(total, best.factor);
    count++;
  }
  return { factor: div(div(v[n - 1] as ComplexDouble, v[0] as ComplexDouble), total), jumps: count };
}
