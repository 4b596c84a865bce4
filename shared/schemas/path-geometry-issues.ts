import { GeometryRules, type GeometryIssue } from './geometry-rules';
import { PI_MULTIPLE } from './pi-multiple';

type Point = { re: string; im: string };
/** A path as the schema has parsed its fields (defaults filled in), before this check. */
type ParsedPath =
  | { kind: 'circle'; center: Point; radius: string; start_angle: string; turns: string; at?: string[] }
  | { kind: 'segment'; from: Point; to: Point; at?: string[] }
  | { kind: 'polyline'; points: Point[]; at?: string[] }
  | {
      kind: 'straddle';
      cut: { kind: 'segment'; from: Point; to: Point } | { kind: 'ray'; from: Point; through: Point };
      along: string[];
      offsets: string[];
    }
  | { kind: 'points'; points: Point[] }
  | { kind: 'grid'; min: Point; max: Point };

/**
 * Why a path would check nothing (docs/suite-format.md, "Paths that check nothing"): every rule
 * a path builder of harness/paths throws on when the run reaches it, so such a path is refused
 * where it is written (the form, an upload, the API) instead of becoming an error cell of every
 * run. The numbers are read as the harness reads them (geometry-rules.ts). Sample counts,
 * empty lists and grids of fewer than 2 × 2 points are the schema's own bounds.
 */
export function pathGeometryIssues(path: ParsedPath): GeometryIssue[] {
  const rules = new GeometryRules();
  const at = (values: string[] | undefined) =>
    values?.forEach((t, i) => rules.fraction(['at', i], t, 't runs from 0 at the start to 1 at the end of a path'));
  switch (path.kind) {
    case 'circle': {
      rules.point(['center'], path.center);
      rules.positive(['radius'], path.radius, 'the circle has no points');
      rules.positive(['turns'], path.turns, 'the circle goes nowhere');
      const pi = PI_MULTIPLE.exec(path.start_angle.trim());
      if (!pi) rules.finite(['start_angle'], path.start_angle);
      else if (pi[3] !== undefined && Number(pi[3]) === 0) rules.say(['start_angle'], 'must not divide by 0');
      else if (!Number.isFinite(Number(pi[2] ?? '1'))) rules.say(['start_angle'], 'must be a finite multiple of pi');
      at(path.at);
      break;
    }
    case 'segment':
      rules.point(['from'], path.from);
      rules.point(['to'], path.to);
      at(path.at);
      break;
    case 'polyline': {
      const vertices = path.points.map((p, i) => rules.point(['points', i], p));
      let total = 0;
      for (let i = 0; i + 1 < vertices.length; i++) {
        const a = vertices[i];
        const b = vertices[i + 1];
        if (a && b) total += Math.hypot(b.re - a.re, b.im - a.im);
      }
      // As polyline-layout.ts measures it: the sum of Math.hypot over the edges, in doubles.
      if (vertices.every((v) => v !== null) && !(total > 0 && Number.isFinite(total)))
        rules.say(
          ['points'],
          total > 0
            ? 'must lie within a finite length of each other'
            : 'must not all be the same point: the path has no length',
        );
      at(path.at);
      break;
    }
    case 'straddle': {
      const ray = path.cut.kind === 'ray';
      const from = rules.point(['cut', 'from'], path.cut.from);
      const towards = path.cut.kind === 'ray' ? path.cut.through : path.cut.to;
      const end = rules.point(['cut', ray ? 'through' : 'to'], towards);
      if (from && end) {
        // As straddle-path.ts measures it: Math.hypot of the difference, in doubles.
        const length = Math.hypot(end.re - from.re, end.im - from.im);
        if (!(length > 0 && Number.isFinite(length)))
          rules.say(
            ['cut', ray ? 'through' : 'to'],
            length > 0
              ? 'must lie within a finite distance of the cut’s start'
              : 'must differ from the cut’s start: a cut of no length has no sides to straddle',
          );
      }
      path.along.forEach((a, i) => {
        if (!ray) rules.fraction(['along', i], a, 'a place along a cut segment is a fraction of its length');
        else {
          const x = rules.finite(['along', i], a);
          if (x !== null && x < 0)
            rules.say(['along', i], 'must be 0 or more: a place along a ray is a distance from its start');
        }
      });
      path.offsets.forEach((o, i) =>
        rules.positive(['offsets', i], o, 'the points on both sides would lie on the cut itself'),
      );
      break;
    }
    case 'points':
      path.points.forEach((p, i) => rules.point(['points', i], p));
      break;
    case 'grid':
      rules.corners(path.min, path.max, 'grid');
      break;
  }
  return rules.issues;
}
