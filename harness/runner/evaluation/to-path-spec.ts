import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { PathSpec } from '../../paths/path-spec';

/**
 * A suite file's path (snake_case, with a `name`, defaults filled in by the schema) as the
 * path generators take it (camelCase, no name). Numbers stay strings: the generators read
 * them exactly (decimal, hex float, p/q; angles also as multiples of π).
 */
export function toPathSpec(path: SuitePath): PathSpec {
  const sampling =
    path.kind === 'straddle' || path.kind === 'grid' || path.kind === 'points'
      ? null
      : path.at !== undefined
        ? { at: path.at }
        : { samples: path.samples as number };
  switch (path.kind) {
    case 'circle':
      return {
        kind: 'circle',
        center: path.center,
        radius: path.radius,
        startAngle: path.start_angle,
        turns: path.turns,
        direction: path.direction,
        ...(sampling as { samples: number }),
      };
    case 'segment':
      return { kind: 'segment', from: path.from, to: path.to, ...(sampling as { samples: number }) };
    case 'polyline':
      return { kind: 'polyline', points: path.points, ...(sampling as { samples: number }) };
    case 'straddle':
      return { kind: 'straddle', cut: path.cut, along: path.along, offsets: path.offsets };
    case 'points':
      return { kind: 'points', points: path.points };
    case 'grid':
      return {
        kind: 'grid',
        min: path.min,
        max: path.max,
        columns: path.columns,
        rows: path.rows,
        bothZeroSigns: path.both_zero_signs,
      };
  }
}
