import { approachZero } from './approach-zero';
import { geometryNumber } from './geometry-number';
import { geometryPoint } from './geometry-point';
import { parseTurns } from './parse-turns';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';
import { sampleParameters } from './sample-parameters';
import { turnCosSin } from './turn-cos-sin';

/**
 * Points of a circle: angle = start + s·2π·turns·t with s = +1 counter-clockwise and
 * −1 clockwise. The angle is kept in turns so quarter turns are exact
 * (turn-cos-sin.ts); z = center + radius·(cos, sin), each part rounded once per
 * operation. A part that comes out exactly zero gets the sign of the side the circle
 * arrives from (at t = 0, the side it leaves into; where it only touches the axis,
 * the side of the center): −2 + 0i reached from above going counter-clockwise,
 * −2 − 0i going clockwise.
 */
export function circlePath(spec: Extract<PathSpec, { kind: 'circle' }>): PathPoint[] {
  const center = geometryPoint(spec.center, 'center');
  const radius = geometryNumber(spec.radius, 'radius');
  if (!(radius > 0)) throw new RangeError(`radius must be positive, got ${radius}`);
  const turns = geometryNumber(spec.turns, 'turns');
  if (!(turns > 0)) throw new RangeError(`turns must be positive, got ${turns}`);
  const start = parseTurns(spec.startAngle, 'startAngle');
  const s = spec.direction === 'ccw' ? 1 : spec.direction === 'cw' ? -1 : NaN;
  if (Number.isNaN(s)) throw new RangeError(`direction must be "ccw" or "cw", got ${String(spec.direction)}`);
  return sampleParameters(spec).map((t) => {
    const [c, sn] = turnCosSin(start + s * turns * t);
    let re = center.re + radius * c;
    let im = center.im + radius * sn;
    // d/dt (cos, sin) = s·2π·turns·(−sin, cos); only the sign matters here.
    if (re === 0) re = approachZero(t, -s * sn, center.re);
    if (im === 0) im = approachZero(t, s * c, center.im);
    return { t, z: { re, im } };
  });
}
