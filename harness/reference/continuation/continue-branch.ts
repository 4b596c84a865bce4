import { BigComplex } from '../complex/big-complex';
import { exp } from '../functions/exp';
import { BigFloat } from '../numbers/big-float';
import { Rational } from '../numbers/rational';
import { FixedTables } from '../real/fixed-tables';
import { realAtan2 } from '../real/real-atan2';
import { realLog } from '../real/real-log';
import type { ContinuationPath, ExactPoint, PathPiece, Point } from './continuation-path';
import type { Crossing, CutLayout, ExactNu } from './cut-layout';
import type { FactoredFunction, Singularity } from './factored-function';
import { LayoutError } from './layout-error';

export interface ContinueInput {
  g: FactoredFunction;
  nu: ExactNu;
  z0: ExactPoint;
  /** f0 as a value, or k for f0 = principal value of g(z0)^ν times e^{2πiνk}. */
  f0: BigComplex | { k: number };
  path: ContinuationPath;
  at: Rational[];
  layout: CutLayout | null;
}

export interface ContinueResult {
  values: { t: Rational; z: BigComplex; f: BigComplex }[];
  /** e^{iν·Δarg g} around the path when it is closed, else null. */
  monodromy: BigComplex | null;
}

/** Working precision: 40 digits need 133 bits; the rest absorbs the sums over many steps. */
const BITS = 192;
/** Largest accepted change of arg P or arg Q over one step, in radians. */
const MAX_STEP_ANGLE = 0.5;
const MAX_NODES = 40000;
const MAX_REFINEMENTS = 6;

interface Node {
  /** null on the lead-in segment from z0 to the path's start (parameter u there). */
  t: Rational | null;
  u: Rational;
  z: BigComplex;
  P: BigComplex;
  Q: BigComplex;
  E: BigComplex;
}

/**
 * A regular branch of g(z)^ν continued along a path (docs/regular-branches.md):
 * f(z) = f0 · exp(ν·(ln|g(z)/g(z0)| + i·Δarg g)), with Δarg g accumulated step by step as
 * Σ Arg(P_{k+1}·conj P_k) − Σ Arg(Q_{k+1}·conj Q_k) + Δ Im(A/B) — each principal Arg is the true
 * change of that factor's argument as long as the step turns it by less than π, and the exp
 * factor's argument Im(A/B) is continuous, so its change is exact.
 *
 * Steps are bisected until each turns arg P and arg Q by at most 0.5 rad and is shorter than
 * half its distance to the nearest zero or pole; then the whole grid is halved and Δarg
 * recomputed, and the result is accepted only when both step sizes agree to the working
 * precision (else the finer grid becomes the base, up to six times). When the path does not
 * start at z0 it is joined to z0 by the straight segment from z0 to its start. A path or
 * lead-in passing through a zero, pole or essential singularity of g is refused with the location.
 *
 * With a cut layout the value is that of the branch on the cut plane: each crossing of a cut
 * multiplies by the layout's jump factor e^{−2πiσF} from then on (a point exactly on a cut keeps
 * the value from before it).
 */
export function continueBranch(input: ContinueInput): ContinueResult {
  const { g, path, layout } = input;
  const singular = [
    ...g.singularities().map((s) => ({ at: s.at, what: describe(s) })),
    ...g.essentialSingularities().map((at) => ({ at, what: 'an essential singularity of the exp factor' })),
  ];
  const z0: Point = [toDouble(input.z0[0]), toDouble(input.z0[1])];
  const start = path.point(Rational.ZERO, BITS);
  const startD: Point = [start.re.toDouble(), start.im.toDouble()];
  const leadIn: PathPiece[] =
    Math.hypot(z0[0] - startD[0], z0[1] - startD[1]) > 0 ? [{ kind: 'segment', a: z0, b: startD, t0: -1, t1: 0 }] : [];
  const pieces = path.pieces();
  for (const s of singular) {
    if (near(s.at, z0)) throw new LayoutError(`z0 is ${s.what} at (${s.at[0]}, ${s.at[1]})`);
    for (const piece of [...leadIn, ...pieces]) {
      const hit = closestApproach(piece, s.at);
      if (hit.distance <= 1e-12 * Math.max(1, Math.hypot(s.at[0], s.at[1]))) {
        const where =
          piece.t0 < 0 ? 'the segment from z0 to the path start' : `the path near t = ${+hit.t.toPrecision(6)}`;
        throw new LayoutError(`${where} passes through ${s.what} at (${s.at[0]}, ${s.at[1]})`);
      }
    }
  }
  if (layout?.onCut(z0))
    throw new LayoutError(`z0 = (${z0[0]}, ${z0[1]}) lies on a cut, where the branch is not fixed`);

  const z0c = new BigComplex(input.z0[0].toBigFloat(BITS), input.z0[1].toBigFloat(BITS));
  const nodeAt = (t: Rational | null, u: Rational): Node => {
    const z = t === null ? z0c.add(start.sub(z0c).mulReal(u.toBigFloat(BITS))).truncate(BITS) : path.point(t, BITS);
    const [P, Q, E] = g.parts(z, BITS);
    return { t, u, z, P, Q, E };
  };
  const first = leadIn.length ? nodeAt(null, Rational.ZERO) : nodeAt(Rational.ZERO, Rational.ZERO);
  const ats = [...input.at].sort((a, b) => a.compare(b));
  let grid: Node[] = [first];
  if (leadIn.length) for (let i = 1; i < 16; i++) grid.push(nodeAt(null, new Rational(BigInt(i), 16n)));
  const n0 = path.initialSteps();
  const ts = new Map<string, Rational>();
  for (let i = 0; i <= n0; i++)
    ts.set(new Rational(BigInt(i), BigInt(n0)).toString(), new Rational(BigInt(i), BigInt(n0)));
  for (const t of ats) ts.set(t.toString(), t);
  for (const t of [...ts.values()].sort((a, b) => a.compare(b)))
    if (leadIn.length || !t.isZero()) grid.push(nodeAt(t, t));

  grid = refine(
    grid,
    singular.map((s) => s.at),
    nodeAt,
  );
  let deltas = accumulate(grid);
  for (let round = 0; ; round++) {
    const finer = halve(grid, nodeAt);
    const finerDeltas = accumulate(finer);
    if (agree(grid, deltas, finer, finerDeltas)) {
      grid = finer;
      deltas = finerDeltas;
      break;
    }
    if (round >= MAX_REFINEMENTS || finer.length > MAX_NODES)
      throw new LayoutError('the argument of g could not be followed along the path (steps kept disagreeing)');
    grid = finer;
    deltas = finerDeltas;
  }

  const crossings = layout ? layout.crossings([...leadIn, ...pieces]) : [];
  const scale = path.scale();
  const f0 = initialValue(input, first);
  const values = ats.map((t) => {
    const i = grid.findIndex((n) => n.t !== null && n.t.compare(t) === 0);
    const node = grid[i] as Node;
    const delta = deltas[i] as BigFloat;
    let f = f0.mul(exp.evaluate(nuTimes(input.nu, logModulusRatio(node, first), delta), BITS).toComplex());
    const td = toDouble(t);
    for (const c of crossings) if (crossedBefore(c, td, node.z, scale)) f = f.mul(jump(c.sigma, c.flow)).truncate(BITS);
    return { t, z: node.z, f: f.truncate(BITS) };
  });
  let monodromy: BigComplex | null = null;
  if (path.closed()) {
    const startIndex = grid.findIndex((n) => n.t !== null && n.t.isZero());
    const loop = (deltas[deltas.length - 1] as BigFloat).sub(deltas[startIndex] as BigFloat);
    monodromy = exp.evaluate(nuTimes(input.nu, BigFloat.ZERO, loop), BITS).toComplex();
  }
  return { values, monodromy };
}

/** Crossings this near a value's t (in t) are decided from the exact point, not from the doubles. */
const CROSSING_WINDOW = 1e-9;

/**
 * Whether the path has crossed the cut edge of `c` by its point z at t. The crossing's t comes from
 * the path in doubles, where an arc's angles are rounded: from 1/8 turn over 3/8 turn, 2π/8 + 2π·3/8
 * lands past π, so an arc ending exactly on the cut at −1 seemed to cross it just before its end. Near
 * t, the side of the line the point z (computed from the exact angle at working precision) lies on
 * decides instead: on the line (within 2^−160 of the path's size, the working precision's noise) it is
 * on the cut and keeps the value from before it; on the σ side it has crossed.
 */
function crossedBefore(c: Crossing, td: number, z: BigComplex, scale: number): boolean {
  if (Math.abs(c.t - td) > CROSSING_WINDOW) return c.t < td;
  const [fx, fy] = c.line.from.map((v) => BigFloat.fromDouble(v)) as [BigFloat, BigFloat];
  const [dx, dy] = c.line.dir.map((v) => BigFloat.fromDouble(v)) as [BigFloat, BigFloat];
  const side = dx.mul(z.im.sub(fy)).sub(dy.mul(z.re.sub(fx)));
  const noise = Math.log2(Math.hypot(...c.line.dir) * Math.max(1, scale)) - 160;
  if (side.isZero() || side.exponent() < noise) return false;
  return side.signbit() === c.sigma < 0;
}

function describe(s: Singularity): string {
  return `a ${s.order > 0 ? 'zero' : 'pole'} of g of order ${Math.abs(s.order)}`;
}

function toDouble(r: Rational): number {
  return Number(r.num) / Number(r.den);
}

function near(a: Point, b: Point): boolean {
  return Math.hypot(a[0] - b[0], a[1] - b[1]) <= 1e-12 * Math.max(1, Math.hypot(a[0], a[1]));
}

/** Distance from p to a path piece, and the t where it is closest. */
function closestApproach(piece: PathPiece, p: Point): { distance: number; t: number } {
  if (piece.kind === 'segment') {
    const d: Point = [piece.b[0] - piece.a[0], piece.b[1] - piece.a[1]];
    const n = d[0] * d[0] + d[1] * d[1];
    const u = n === 0 ? 0 : Math.min(1, Math.max(0, ((p[0] - piece.a[0]) * d[0] + (p[1] - piece.a[1]) * d[1]) / n));
    const x = piece.a[0] + u * d[0];
    const y = piece.a[1] + u * d[1];
    return { distance: Math.hypot(p[0] - x, p[1] - y), t: piece.t0 + u * (piece.t1 - piece.t0) };
  }
  const r = Math.hypot(p[0] - piece.center[0], p[1] - piece.center[1]);
  const phi = Math.atan2(p[1] - piece.center[1], p[0] - piece.center[0]);
  const s = Math.sign(piece.sweep);
  const angle = (((s * (phi - piece.theta0)) % (2 * Math.PI)) + 2 * Math.PI) % (2 * Math.PI);
  if (angle <= Math.abs(piece.sweep))
    return {
      distance: Math.abs(r - piece.radius),
      t: piece.t0 + (angle / Math.abs(piece.sweep)) * (piece.t1 - piece.t0),
    };
  const end = (theta: number) =>
    Math.hypot(
      p[0] - piece.center[0] - piece.radius * Math.cos(theta),
      p[1] - piece.center[1] - piece.radius * Math.sin(theta),
    );
  const a = end(piece.theta0);
  const b = end(piece.theta0 + piece.sweep);
  return a <= b ? { distance: a, t: piece.t0 } : { distance: b, t: piece.t1 };
}

function argChange(a: BigComplex, b: BigComplex): BigFloat {
  const w = b.mul(a.conj()).truncate(BITS + 32);
  return realAtan2(w.im, w.re, BITS);
}

function stepOk(a: Node, b: Node, singular: Point[]): boolean {
  const dp = Math.abs(argChange(a.P, b.P).toDouble());
  const dq = Math.abs(argChange(a.Q, b.Q).toDouble());
  if (dp > MAX_STEP_ANGLE || dq > MAX_STEP_ANGLE) return false;
  const pa: Point = [a.z.re.toDouble(), a.z.im.toDouble()];
  const pb: Point = [b.z.re.toDouble(), b.z.im.toDouble()];
  const h = Math.hypot(pa[0] - pb[0], pa[1] - pb[1]);
  return singular.every(
    (s) => h <= 0.5 * Math.min(Math.hypot(s[0] - pa[0], s[1] - pa[1]), Math.hypot(s[0] - pb[0], s[1] - pb[1])),
  );
}

function midpoint(a: Node, b: Node, nodeAt: (t: Rational | null, u: Rational) => Node): Node {
  const half = new Rational(1n, 2n);
  if (a.t === null && b.t === null) return nodeAt(null, a.u.add(b.u).mul(half));
  const ta = a.t ?? Rational.ZERO;
  return nodeAt(ta.add(b.t as Rational).mul(half), ta.add(b.t as Rational).mul(half));
}

function refine(grid: Node[], singular: Point[], nodeAt: (t: Rational | null, u: Rational) => Node): Node[] {
  const out: Node[] = [grid[0] as Node];
  const stack = grid.slice(1).reverse();
  while (stack.length) {
    const b = stack.pop() as Node;
    const a = out[out.length - 1] as Node;
    if (stepOk(a, b, singular) || out.length + stack.length > MAX_NODES) {
      out.push(b);
    } else {
      stack.push(b, midpoint(a, b, nodeAt));
    }
  }
  return out;
}

function halve(grid: Node[], nodeAt: (t: Rational | null, u: Rational) => Node): Node[] {
  const out: Node[] = [grid[0] as Node];
  for (let i = 1; i < grid.length; i++)
    out.push(midpoint(grid[i - 1] as Node, grid[i] as Node, nodeAt), grid[i] as Node);
  return out;
}

/** Δarg g from the first node to each node. */
function accumulate(grid: Node[]): BigFloat[] {
  const out: BigFloat[] = [BigFloat.ZERO];
  let sum = BigFloat.ZERO;
  for (let i = 1; i < grid.length; i++) {
    const a = grid[i - 1] as Node;
    const b = grid[i] as Node;
    sum = sum
      .add(argChange(a.P, b.P))
      .sub(argChange(a.Q, b.Q))
      .add(b.E.im.sub(a.E.im))
      .truncate(BITS + 16);
    out.push(sum);
  }
  return out;
}

/** Whether Δarg at every node of the coarse grid (all of which are in the finer one) agrees to working precision. */
function agree(coarse: Node[], cd: BigFloat[], fine: Node[], fd: BigFloat[]): boolean {
  const tolerance = BigFloat.of(false, 1n, 24 - BITS);
  for (let i = 0; i < coarse.length; i++) {
    const d = (cd[i] as BigFloat).sub(fd[2 * i] as BigFloat).abs();
    const scale = (cd[i] as BigFloat).abs().add(BigFloat.ONE);
    if (d.compare(tolerance.mul(scale)) > 0) return false;
  }
  return fine.length === 2 * coarse.length - 1;
}

/** ln|g(z)/g(z0)| = ½ ln(|P|²/|P0|²) − ½ ln(|Q|²/|Q0|²) + Re(E − E0). */
function logModulusRatio(node: Node, first: Node): BigFloat {
  const half = (x: BigComplex, y: BigComplex) => realLog(x.norm().div(y.norm(), BITS + 8), BITS).scale(-1);
  return half(node.P, first.P)
    .sub(half(node.Q, first.Q))
    .add(node.E.re.sub(first.E.re))
    .truncate(BITS + 8);
}

/** ν·(L + iΔ) for ν = νr + iνi: (νr L − νi Δ) + i(νr Δ + νi L). */
function nuTimes(nu: ExactNu, L: BigFloat, delta: BigFloat): BigComplex {
  const r = nu.re.toBigFloat(BITS + 8);
  const i = nu.im.toBigFloat(BITS + 8);
  return new BigComplex(r.mul(L).sub(i.mul(delta)), r.mul(delta).add(i.mul(L))).truncate(BITS + 8);
}

/** e^{−2πiσF}. */
function jump(sigma: 1 | -1, flow: ExactNu): BigComplex {
  const twoPi = BigFloat.fromBigInt(FixedTables.pi(BITS + 8), 1 - (BITS + 8));
  const s = BigFloat.fromBigInt(BigInt(-sigma));
  const angle = twoPi.mul(s);
  return exp
    .evaluate(
      new BigComplex(angle.mul(flow.im.toBigFloat(BITS + 8)).negate(), angle.mul(flow.re.toBigFloat(BITS + 8))),
      BITS,
    )
    .toComplex();
}

function initialValue(input: ContinueInput, first: Node): BigComplex {
  if (input.f0 instanceof BigComplex) return input.f0;
  const g0 = first.P.mul(first.Q.conj()).truncate(BITS);
  const e0 = exp.evaluate(new BigComplex(BigFloat.ZERO, first.E.im), BITS).toComplex();
  const g = g0.mul(e0).truncate(BITS);
  const modulus = realLog(first.P.norm().div(first.Q.norm(), BITS), BITS).scale(-1).add(first.E.re);
  const arg = realAtan2(g.im, g.re, BITS);
  const twoPiK = BigFloat.fromBigInt(BigInt(input.f0.k) * FixedTables.pi(BITS + 8), 1 - (BITS + 8));
  return exp.evaluate(nuTimes(input.nu, modulus, arg.add(twoPiK)), BITS).toComplex();
}
