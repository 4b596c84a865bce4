import { geometryNumber } from './geometry-number';
import { PI_MULTIPLE } from '../../shared/schemas/pi-multiple';

/**
 * An angle as a fraction of a full turn. A rational multiple of π written "pi",
 * "-pi/2", "3pi/4", "0.5*pi" is converted without going through radians, so
 * "pi/2" is exactly 0.25. A number (or decimal string) is radians divided by 2π in
 * doubles; Math.PI/2, Math.PI and 2·Math.PI still give exactly 0.25, 0.5 and 1
 * because they are power-of-two multiples of the same double, but 3·Math.PI/2
 * need not give 0.75: use "3pi/2".
 */
export function parseTurns(angle: number | string, what = 'angle'): number {
  if (typeof angle === 'string') {
    const m = PI_MULTIPLE.exec(angle.trim());
    if (m) {
      const num = m[2] === undefined ? 1 : Number(m[2]);
      const den = m[3] === undefined ? 1 : Number(m[3]);
      if (den === 0) throw new RangeError(`${what}: "${angle}" divides by zero`);
      const turns = num / (2 * den);
      return m[1] === '-' ? -turns : turns;
    }
  }
  return geometryNumber(angle, what) / (2 * Math.PI);
}
