import { geometryPoint } from './geometry-point';
import { lerpComponent } from './lerp-component';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';
import { sampleParameters } from './sample-parameters';

/**
 * Points of a polyline where t is the fraction of arc length: the point at t lies
 * t·L along the way, L the total of the edge lengths (Math.hypot per edge).
 * Vertices come out exactly as written, zero signs included, at t = 0, t = 1 and
 * wherever t·L lands on a cumulative length; zero-length edges are skipped.
 */
export function polylinePath(spec: Extract<PathSpec, { kind: 'polyline' }>): PathPoint[] {
  const vertices = spec.points.map((p, i) => geometryPoint(p, `points[${i}]`));
  if (vertices.length < 2) throw new RangeError('a polyline needs at least two points');
  const edges: { a: { re: number; im: number }; b: { re: number; im: number }; start: number; length: number }[] = [];
  let total = 0;
  for (let i = 0; i + 1 < vertices.length; i++) {
    const a = vertices[i] as { re: number; im: number };
    const b = vertices[i + 1] as { re: number; im: number };
    const length = Math.hypot(b.re - a.re, b.im - a.im);
    if (length === 0) continue;
    edges.push({ a, b, start: total, length });
    total += length;
  }
  if (!(total > 0) || !Number.isFinite(total)) throw new RangeError('a polyline needs a finite, non-zero length');
  const last = vertices[vertices.length - 1] as { re: number; im: number };
  return sampleParameters(spec).map((t) => {
    if (t === 1) return { t, z: { re: last.re, im: last.im } };
    const s = t * total;
    const edge = edges.find((e) => s < e.start + e.length) ?? (edges[edges.length - 1] as (typeof edges)[number]);
    const local = Math.min(1, Math.max(0, (s - edge.start) / edge.length));
    return { t, z: { re: lerpComponent(edge.a.re, edge.b.re, local), im: lerpComponent(edge.a.im, edge.b.im, local) } };
  });
}
