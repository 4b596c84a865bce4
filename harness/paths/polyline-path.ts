import { lerpComponent } from './lerp-component';
import type { PathPoint } from './path-point';
import type { PathSpec } from './path-spec';
import { polylineLayout } from './polyline-layout';

/**
 * Points of a polyline where t is the fraction of arc length: the point at t lies t·L along the
 * way, L the total of the edge lengths (Math.hypot per edge). Every vertex is among the points
 * (polyline-layout.ts), exactly as written, zero signs included, at its own t; points come in
 * increasing t. Zero-length edges are skipped.
 */
export function polylinePath(spec: Extract<PathSpec, { kind: 'polyline' }>): PathPoint[] {
  const { vertices, edges, total, parameters } = polylineLayout(spec);
  return parameters.map(({ t, vertex }) => {
    if (vertex !== null) {
      const v = vertices[vertex] as { re: number; im: number };
      return { t, z: { re: v.re, im: v.im }, label: `vertex ${vertex + 1}` };
    }
    const s = t * total;
    const edge = edges.find((e) => s < e.start + e.length) ?? (edges[edges.length - 1] as (typeof edges)[number]);
    const local = Math.min(1, Math.max(0, (s - edge.start) / edge.length));
    return { t, z: { re: lerpComponent(edge.a.re, edge.b.re, local), im: lerpComponent(edge.a.im, edge.b.im, local) } };
  });
}
