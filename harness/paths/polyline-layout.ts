import { geometryPoint } from './geometry-point';
import type { PathSpec } from './path-spec';
import { sampleParameters } from './sample-parameters';

type Xy = { re: number; im: number };

/**
 * One sampled place of a polyline: its t (fraction of arc length), and where it comes from — the
 * index of a written vertex, of a sample (`samples` or `at`), or both when they fall on the same t.
 */
export interface PolylineParameter {
  t: number;
  vertex: number | null;
  sample: number | null;
}

/** A polyline's vertices as doubles, its edges of non-zero length, and every t it is sampled at. */
export interface PolylineLayout {
  vertices: Xy[];
  edges: { a: Xy; b: Xy; start: number; length: number }[];
  total: number;
  parameters: PolylineParameter[];
}

/**
 * Where a polyline is sampled: the t of every sample (as written, i/(samples − 1) or `at`) and
 * the t of every vertex (its cumulative edge length over the total, Math.hypot per edge), merged
 * in increasing t. A vertex is always among the points, so one placed 1e-9 from a cut is
 * evaluated whatever the sampling; a sample whose t equals a vertex's is that vertex, and a vertex
 * on a zero-length edge shares the t of the vertex before it and is not repeated.
 */
export function polylineLayout(spec: Extract<PathSpec, { kind: 'polyline' }>): PolylineLayout {
  const vertices = spec.points.map((p, i) => geometryPoint(p, `points[${i}]`));
  if (vertices.length < 2) throw new RangeError('a polyline needs at least two points');
  const edges: PolylineLayout['edges'] = [];
  const at: number[] = [0];
  let total = 0;
  for (let i = 0; i + 1 < vertices.length; i++) {
    const a = vertices[i] as Xy;
    const b = vertices[i + 1] as Xy;
    const length = Math.hypot(b.re - a.re, b.im - a.im);
    if (length > 0) edges.push({ a, b, start: total, length });
    total += length;
    at.push(total);
  }
  if (!(total > 0) || !Number.isFinite(total)) throw new RangeError('a polyline needs a finite, non-zero length');
  const vertexTs = at.map((s, i) => (i === at.length - 1 ? 1 : s / total));
  const samples = sampleParameters(spec);
  const parameters: PolylineParameter[] = samples.map((t, i) => ({ t, vertex: null, sample: i }));
  const byT = new Map<number, PolylineParameter>();
  for (const p of parameters) if (!byT.has(p.t)) byT.set(p.t, p);
  vertexTs.forEach((t, v) => {
    const known = byT.get(t);
    if (known) {
      known.vertex ??= v;
      return;
    }
    const p: PolylineParameter = { t, vertex: v, sample: null };
    byT.set(t, p);
    parameters.push(p);
  });
  // Stable: samples written twice stay twice, in the order written among equal t.
  parameters.sort((x, y) => x.t - y.t);
  return { vertices, edges, total, parameters };
}
