import { formatDouble } from '../../harness/reference/numbers/format-double';
import type { OraclePoint } from './python-oracle';

/** Each cut point with both zero signs across the cut (and along it when that part is zero too). */
export function cutPointsOf(cuts: Record<string, [number, number][]>): OraclePoint[] {
  const out: OraclePoint[] = [];
  for (const [fn, points] of Object.entries(cuts)) {
    for (const [x, y] of points) {
      for (const sx of [1, -1]) {
        for (const sy of [1, -1]) {
          if ((x !== 0 && sx < 0) || (y !== 0 && sy < 0)) continue;
          out.push({ fn, z: [formatDouble(x === 0 ? sx * 0 : x), formatDouble(y === 0 ? sy * 0 : y)] });
        }
      }
    }
  }
  return out;
}
