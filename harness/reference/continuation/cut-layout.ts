import { Rational } from '../numbers/rational';
import type { PathPiece, Point } from './continuation-path';
import type { Singularity } from './factored-function';
import { LayoutError } from './layout-error';

/** A cut as given: a polyline, optionally continued to infinity along its last segment's direction. */
export interface CutSpec {
  points: Point[];
  toInfinity: boolean;
}

/** ν as exact real and imaginary parts. */
export interface ExactNu {
  re: Rational;
  im: Rational;
}

/** A crossing of the path with a cut: where (t), which way (σ = ±1), and the flow F through that cut edge. */
export interface Crossing {
  t: number;
  sigma: 1 | -1;
  flow: ExactNu;
  /** The edge's line, oriented as σ is measured: after the crossing the path is on its σ side. */
  line: { from: Point; dir: Point };
}

interface Edge {
  a: number;
  b: number;
  from: Point;
  /** Direction from `from`; for a ray (b = ∞) the ray's direction. */
  dir: Point;
  ray: boolean;
  /** Flow of ν·order from child to parent, and the direction child → parent. */
  flow?: ExactNu;
  orientation?: 1 | -1;
}

const INFINITY_NODE = 0;
/** Edge ends are widened by this much so a crossing at a vertex shared by two edges is found on both; one is then kept. */
const EDGE_SLACK = 1e-12;
const fmt = (p: Point) => `(${+p[0].toPrecision(12)}, ${+p[1].toPrecision(12)})`;
const cross = (a: Point, b: Point) => a[0] * b[1] - a[1] * b[0];

/**
 * A validated cut layout for a regular branch of g(z)^ν.
 *
 * The cuts are read as a graph on the Riemann sphere (rays meet at ∞). Valid means:
 * every branch point (a zero or pole of order m with ν·m ∉ ℤ) lies on a cut; the graph has
 * no cycle (a closed chain of cuts would split the plane, leaving part of it unreached by
 * continuation from z0); and each component that does not reach ∞ carries an integer total
 * ν·Σm, so a loop around it — a loop crossing no cut — has monodromy e^{2πiν(Z−P)} = 1
 * (the argument principle). Every other cut-free loop encircles whole components, so these
 * are all the conditions.
 *
 * In such a forest the charges ν·m flow along the cuts toward ∞ (or toward an arbitrary
 * root in a finite component, whose leftover is an integer). Crossing an edge whose flow
 * from child to parent is F, with the path going to the edge's left-to-right side
 * (σ = sign of cross(edge direction, path direction) = +1), multiplies the continued value
 * by e^{−2πiσF} to stay on the branch of the cut plane: for √z with the cut (−∞, 0] (flow ½
 * toward −∞), going down through the cut gives the factor e^{−iπ} = −1, as it must.
 */
export class CutLayout {
  private constructor(
    private readonly nodes: Point[],
    private readonly edges: Edge[],
  ) {}

  static build(cuts: CutSpec[], singularities: Singularity[], nu: ExactNu, tolerance = 1e-9): CutLayout {
    const nodes: Point[] = [[Infinity, Infinity]];
    const near = (p: Point, q: Point) =>
      Math.hypot(p[0] - q[0], p[1] - q[1]) <= tolerance * Math.max(1, Math.hypot(p[0], p[1]));
    const nodeAt = (p: Point) => {
      const i = nodes.findIndex((q, k) => k !== INFINITY_NODE && near(p, q));
      if (i >= 0) return i;
      nodes.push(p);
      return nodes.length - 1;
    };
    const edges: Edge[] = [];
    for (const cut of cuts) {
      if (cut.points.length < (cut.toInfinity ? 2 : 2)) throw new LayoutError('a cut needs at least two points');
      const vertices: Point[] = [cut.points[0] as Point];
      for (let i = 1; i < cut.points.length; i++) {
        const a = cut.points[i - 1] as Point;
        const b = cut.points[i] as Point;
        const inner = singularities
          .map((s) => ({ s, u: projection(s.at, a, b) }))
          .filter(({ s, u }) => u > 0 && u < 1 && near(s.at, [a[0] + u * (b[0] - a[0]), a[1] + u * (b[1] - a[1])]))
          .sort((x, y) => x.u - y.u);
        for (const { s } of inner) vertices.push(s.at);
        vertices.push(b);
      }
      const ids = vertices.map(nodeAt);
      for (let i = 1; i < ids.length; i++) {
        const from = vertices[i - 1] as Point;
        const to = vertices[i] as Point;
        if (ids[i - 1] !== ids[i])
          edges.push({
            a: ids[i - 1] as number,
            b: ids[i] as number,
            from,
            dir: [to[0] - from[0], to[1] - from[1]],
            ray: false,
          });
      }
      if (cut.toInfinity) {
        const last = cut.points[cut.points.length - 1] as Point;
        const prev = cut.points[cut.points.length - 2] as Point;
        edges.push({
          a: ids[ids.length - 1] as number,
          b: INFINITY_NODE,
          from: last,
          dir: [last[0] - prev[0], last[1] - prev[1]],
          ray: true,
        });
      }
    }
    const charge: ExactNu[] = nodes.map(() => ({ re: Rational.ZERO, im: Rational.ZERO }));
    for (const s of singularities) {
      const m = new Rational(BigInt(s.order));
      const q = { re: nu.re.mul(m), im: nu.im.mul(m) };
      const i = nodes.findIndex((p, k) => k !== INFINITY_NODE && near(s.at, p));
      const branch = !q.im.isZero() || !q.re.isInteger();
      if (i < 0) {
        if (branch) {
          throw new LayoutError(
            `the branch point at ${fmt(s.at)} lies on no cut: it is a ${s.order > 0 ? 'zero' : 'pole'} of g of order ${Math.abs(s.order)}, and going once around it multiplies the value by ${turnFactor(q)}, so a cut must start or end there`,
          );
        }
        continue;
      }
      charge[i] = add(charge[i] as ExactNu, q);
    }
    const parent = nodes.map((_, i) => i);
    const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i] as number)));
    for (const e of edges) {
      const ra = find(e.a);
      const rb = find(e.b);
      if (ra === rb)
        throw new LayoutError(`the cuts close a loop at ${fmt(e.from)}: they would split the plane in two`);
      parent[ra] = rb;
    }
    const layout = new CutLayout(nodes, edges);
    layout.orient(charge, find);
    return layout;
  }

  /** Whether p lies on a cut (within the tolerance). */
  onCut(p: Point, tolerance = 1e-12): boolean {
    return this.edges.some((e) => {
      const u = e.ray
        ? Math.max(0, projectionRay(p, e.from, e.dir))
        : Math.min(1, Math.max(0, projection(p, e.from, [e.from[0] + e.dir[0], e.from[1] + e.dir[1]])));
      const x: Point = [e.from[0] + u * e.dir[0], e.from[1] + u * e.dir[1]];
      return Math.hypot(p[0] - x[0], p[1] - x[1]) <= tolerance * Math.max(1, Math.hypot(p[0], p[1]));
    });
  }

  /** Every crossing of the path pieces with a cut edge that carries a non-zero flow, in t order. */
  crossings(pieces: PathPiece[]): Crossing[] {
    const out: Crossing[] = [];
    for (const e of this.edges) {
      const flow = e.flow as ExactNu;
      if (flow.re.isZero() && flow.im.isZero()) continue;
      const d: Point = [e.dir[0] * (e.orientation as number), e.dir[1] * (e.orientation as number)];
      for (const piece of pieces) {
        for (const { t, tangent } of intersections(piece, e)) {
          const c = cross(d, tangent);
          if (c !== 0) out.push({ t, sigma: c > 0 ? 1 : -1, flow, line: { from: e.from, dir: d } });
        }
      }
    }
    out.sort((x, y) => x.t - y.t);
    return out.filter((c, i) => {
      const prev = out[i - 1];
      return !prev || Math.abs(prev.t - c.t) > 1e-9 || prev.sigma !== c.sigma || !sameFlow(prev.flow, c.flow);
    });
  }

  private orient(charge: ExactNu[], find: (i: number) => number): void {
    const adjacency = this.nodes.map(() => [] as number[]);
    this.edges.forEach((e, k) => {
      adjacency[e.a]?.push(k);
      adjacency[e.b]?.push(k);
    });
    const seen = new Set<number>();
    const subtree = (node: number, via: number): ExactNu => {
      seen.add(node);
      let sum = charge[node] as ExactNu;
      for (const k of adjacency[node] as number[]) {
        if (k === via) continue;
        const e = this.edges[k] as Edge;
        const child = e.a === node ? e.b : e.a;
        const s = subtree(child, k);
        e.flow = s;
        e.orientation = child === e.a ? 1 : -1;
        sum = add(sum, s);
      }
      return sum;
    };
    const roots = [INFINITY_NODE, ...this.nodes.map((_, i) => i).filter((i) => i !== INFINITY_NODE)];
    for (const r of roots) {
      if (seen.has(r) || (adjacency[r] as number[]).length === 0) continue;
      const total = subtree(r, -1);
      if (find(r) !== find(INFINITY_NODE) && (!total.im.isZero() || !total.re.isInteger())) {
        const members = this.nodes.filter((_, i) => i !== INFINITY_NODE && find(i) === find(r)).map(fmt);
        throw new LayoutError(
          `a loop around the cut through ${members.join(', ')} crosses no cut, yet going once around it multiplies the value by ${turnFactor(total)}, not 1: ` +
            `extend that cut to another branch point or to infinity`,
        );
      }
    }
  }
}

function sameFlow(a: ExactNu, b: ExactNu): boolean {
  return a.re.compare(b.re) === 0 && a.im.compare(b.im) === 0;
}

function add(a: ExactNu, b: ExactNu): ExactNu {
  return { re: a.re.add(b.re), im: a.im.add(b.im) };
}

/**
 * What one turn around charge q multiplies a value by, as a formula: e^{2πi·q}. Said instead of
 * "ν·m" or "ν·(Z−P)", which name the sum but not what it does to the value.
 */
function turnFactor(q: ExactNu): string {
  return `e^{2πi·${q.im.isZero() ? show(q) : `(${show(q)})`}}`;
}

function show(q: ExactNu): string {
  return q.im.isZero() ? q.re.toString() : `${q.re.toString()} + ${q.im.toString()}i`;
}

function projection(p: Point, a: Point, b: Point): number {
  const d: Point = [b[0] - a[0], b[1] - a[1]];
  const n = d[0] * d[0] + d[1] * d[1];
  return n === 0 ? 0 : ((p[0] - a[0]) * d[0] + (p[1] - a[1]) * d[1]) / n;
}

function projectionRay(p: Point, a: Point, d: Point): number {
  const n = d[0] * d[0] + d[1] * d[1];
  return n === 0 ? 0 : ((p[0] - a[0]) * d[0] + (p[1] - a[1]) * d[1]) / n;
}

/** Where a path piece meets an edge: parameter t (excluding the piece's start) and the path's direction there. */
function intersections(piece: PathPiece, e: Edge): { t: number; tangent: Point }[] {
  const inEdge = (v: number) => v >= -EDGE_SLACK && (e.ray || v <= 1 + EDGE_SLACK);
  if (piece.kind === 'segment') {
    const r: Point = [piece.b[0] - piece.a[0], piece.b[1] - piece.a[1]];
    const den = cross(r, e.dir);
    if (den === 0) return [];
    const qp: Point = [e.from[0] - piece.a[0], e.from[1] - piece.a[1]];
    const u = cross(qp, e.dir) / den;
    const v = cross(qp, r) / den;
    if (u <= 0 || u > 1 || !inEdge(v)) return [];
    return [{ t: piece.t0 + u * (piece.t1 - piece.t0), tangent: r }];
  }
  const { center: c, radius: R, theta0, sweep } = piece;
  const w: Point = [e.from[0] - c[0], e.from[1] - c[1]];
  const A = e.dir[0] * e.dir[0] + e.dir[1] * e.dir[1];
  const B = 2 * (e.dir[0] * w[0] + e.dir[1] * w[1]);
  const C = w[0] * w[0] + w[1] * w[1] - R * R;
  const disc = B * B - 4 * A * C;
  if (A === 0 || disc <= 0) return [];
  const out: { t: number; tangent: Point }[] = [];
  for (const v of [(-B - Math.sqrt(disc)) / (2 * A), (-B + Math.sqrt(disc)) / (2 * A)]) {
    if (!inEdge(v)) continue;
    const phi = Math.atan2(w[1] + v * e.dir[1], w[0] + v * e.dir[0]);
    const s = Math.sign(sweep);
    const tangent: Point = [-s * Math.sin(phi), s * Math.cos(phi)];
    const first = (((s * (phi - theta0)) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
    for (let angle = first; angle <= Math.abs(sweep) + 1e-15; angle += 2 * Math.PI) {
      if (angle > 0) out.push({ t: piece.t0 + (angle / Math.abs(sweep)) * (piece.t1 - piece.t0), tangent });
    }
  }
  return out;
}
