import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import { exactTurns } from '../../paths/exact-turns';
import type { ExactPoint, PathSpec } from '../../reference/continuation/continuation-path';
import { parseExact } from '../../reference/continuation/parse-exact';
import type { WireComplex } from '../../../shared/wire-complex';

/**
 * A continuous suite path as the continuation engine's exact path, or null for a straddle or a
 * grid. Nothing is rounded on the way: a start angle written as a multiple of π ("pi/2") goes
 * in as that exact number of turns, one in radians as those exact radians, and the turns,
 * centre, radius and points as the exact numbers written.
 */
export function continuationPathOf(path: SuitePath): PathSpec | null {
  const point = (c: WireComplex, name: string): ExactPoint => [
    parseExact(c.re, `${path.name}: ${name}.re`),
    parseExact(c.im, `${path.name}: ${name}.im`),
  ];
  switch (path.kind) {
    case 'circle': {
      const turns = exactTurns(path.start_angle, `${path.name}: start_angle`);
      return {
        kind: 'circle',
        center: point(path.center, 'center'),
        radius: parseExact(path.radius, `${path.name}: radius`),
        startAngle: turns
          ? { kind: 'turns', turns }
          : { kind: 'radians', radians: parseExact(path.start_angle, `${path.name}: start_angle`) },
        turns: parseExact(path.turns, `${path.name}: turns`),
        ccw: path.direction === 'ccw',
      };
    }
    case 'segment':
      return { kind: 'polyline', points: [point(path.from, 'from'), point(path.to, 'to')] };
    case 'polyline':
      return { kind: 'polyline', points: path.points.map((p, i) => point(p, `points.${i}`)) };
    default:
      return null;
  }
}
