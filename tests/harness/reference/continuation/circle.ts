import type { WireComplex } from '../../../../shared/wire-complex';

/** A circle path of a `continue` request. */
export function circle(
  center: WireComplex,
  radius: string,
  turns = 1,
  direction: 'ccw' | 'cw' = 'ccw',
  startAngle = '0',
) {
  return { kind: 'circle', center, radius, turns, direction, start_angle: startAngle };
}
