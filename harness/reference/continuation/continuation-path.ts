import { BigComplex } from '../complex/big-complex';
import { BigFloat } from '../numbers/big-float';
import { Rational } from '../numbers/rational';
import { FixedTables } from '../real/fixed-tables';
import { realSinCos } from '../real/real-sin-cos';
import type { ExactAngle } from './exact-angle';

export type Point = [number, number];
export type ExactPoint = [Rational, Rational];

/** A piece of a path in doubles, for geometry: where it passes, what it crosses. t runs over [t0, t1]. */
export type PathPiece =
  | { kind: 'segment'; a: Point; b: Point; t0: number; t1: number }
  | { kind: 'arc'; center: Point; radius: number; theta0: number; sweep: number; t0: number; t1: number };

export type PathSpec =
  | { kind: 'circle'; center: ExactPoint; radius: Rational; startAngle: ExactAngle; turns: Rational; ccw: boolean }
  | { kind: 'polyline'; points: ExactPoint[] };

const toDouble = (r: Rational) => Number(r.num) / Number(r.den);
const startRadians = (a: ExactAngle) => (a.kind === 'turns' ? 2 * Math.PI * toDouble(a.turns) : toDouble(a.radians));

/**
 * A path of a suite (docs/vocabulary.md) with parameter t ∈ [0, 1]: on a circle the angle is
 * start + s·2π·turns·t (s = +1 counter-clockwise), on a polyline t is the fraction of arc length.
 * Points are computed at working precision from the exact geometry (a start angle in turns joins
 * the sweep before the one multiplication by π); pieces give the same path in doubles.
 */
export class ContinuationPath {
  private lengths: BigFloat[] | null = null;
  private lengthBits = 0;

  constructor(readonly spec: PathSpec) {}

  /** Whether the path ends where it starts (a circle with whole turns, or a polyline whose last point is its first). */
  closed(): boolean {
    if (this.spec.kind === 'circle') return this.spec.turns.isInteger() && !this.spec.turns.isZero();
    const pts = this.spec.points;
    const a = pts[0] as ExactPoint;
    const b = pts[pts.length - 1] as ExactPoint;
    return pts.length > 2 && a[0].compare(b[0]) === 0 && a[1].compare(b[1]) === 0;
  }

  point(t: Rational, bits: number): BigComplex {
    const s = this.spec;
    if (s.kind === 'circle') {
      const q = t.mul(s.turns).mul(new Rational(s.ccw ? 2n : -2n));
      const theta =
        s.startAngle.kind === 'turns'
          ? piTimes(s.startAngle.turns.mul(new Rational(2n)).add(q), bits)
          : s.startAngle.radians.toBigFloat(bits).add(piTimes(q, bits));
      const [sin, cos] = realSinCos(theta.truncate(bits + 16), bits);
      const r = s.radius.toBigFloat(bits);
      return new BigComplex(
        s.center[0].toBigFloat(bits).add(r.mul(cos)),
        s.center[1].toBigFloat(bits).add(r.mul(sin)),
      ).truncate(bits);
    }
    const pts = s.points.map(([x, y]) => new BigComplex(x.toBigFloat(bits), y.toBigFloat(bits)));
    if (t.isZero()) return pts[0] as BigComplex;
    if (t.compare(Rational.ONE) === 0) return pts[pts.length - 1] as BigComplex;
    const lengths = this.segmentLengths(pts, bits);
    const total = lengths.reduce((a, b) => a.add(b), BigFloat.ZERO);
    let target = total.mul(t.toBigFloat(bits)).truncate(bits);
    for (let i = 0; i < lengths.length; i++) {
      const len = lengths[i] as BigFloat;
      if (target.compare(len) <= 0 || i === lengths.length - 1) {
        const a = pts[i] as BigComplex;
        const d = (pts[i + 1] as BigComplex).sub(a);
        const f = len.isZero() ? BigFloat.ZERO : target.div(len, bits);
        return a.add(d.mulReal(f)).truncate(bits);
      }
      target = target.sub(len);
    }
    return pts[0] as BigComplex;
  }

  /** The path as double-precision pieces with their t ranges. */
  pieces(): PathPiece[] {
    const s = this.spec;
    if (s.kind === 'circle') {
      return [
        {
          kind: 'arc',
          center: [toDouble(s.center[0]), toDouble(s.center[1])],
          radius: toDouble(s.radius),
          theta0: startRadians(s.startAngle),
          sweep: (s.ccw ? 1 : -1) * 2 * Math.PI * toDouble(s.turns),
          t0: 0,
          t1: 1,
        },
      ];
    }
    const pts = s.points.map(([x, y]) => [toDouble(x), toDouble(y)] as Point);
    const lens = pts.slice(1).map((p, i) => Math.hypot(p[0] - (pts[i] as Point)[0], p[1] - (pts[i] as Point)[1]));
    const total = lens.reduce((a, b) => a + b, 0) || 1;
    let acc = 0;
    return lens.map((len, i) => {
      const piece: PathPiece = {
        kind: 'segment',
        a: pts[i] as Point,
        b: pts[i + 1] as Point,
        t0: acc / total,
        t1: (acc + len) / total,
      };
      acc += len;
      return piece;
    });
  }

  /** A length typical of the path (|center| + radius, or the largest |point|), for deciding what is zero in its points. */
  scale(): number {
    const s = this.spec;
    const d = (r: Rational) => Math.abs(Number(r.num) / Number(r.den));
    if (s.kind === 'circle') return Math.hypot(d(s.center[0]), d(s.center[1])) + d(s.radius);
    return Math.max(...s.points.map(([x, y]) => Math.hypot(d(x), d(y))));
  }

  /** Number of pieces to start the step grid with, by geometry: 64 per turn, 16 per segment. */
  initialSteps(): number {
    return this.spec.kind === 'circle'
      ? 64 * Math.max(1, Math.ceil(Math.abs(toDouble(this.spec.turns))))
      : 16 * (this.spec.points.length - 1);
  }

  private segmentLengths(pts: BigComplex[], bits: number): BigFloat[] {
    if (!this.lengths || this.lengthBits < bits) {
      this.lengths = pts.slice(1).map((p, i) =>
        p
          .sub(pts[i] as BigComplex)
          .norm()
          .sqrt(bits + 8),
      );
      this.lengthBits = bits;
    }
    return this.lengths;
  }
}

/** q·π at `bits` for a rational q. */
function piTimes(q: Rational, bits: number): BigFloat {
  const G = bits + 16;
  return BigFloat.fromBigInt(q.num * FixedTables.pi(G)).div(BigFloat.fromBigInt(q.den << BigInt(G)), bits + 8);
}
