import type { Suite } from '../../shared/schemas/suite-schema';
import type { SuitePath } from '../../shared/schemas/suite-path-schema';
import type { ComplexDouble } from '../checks/complex-double';
import { CUT_CONVENTION_RULE } from '../checks/function-rules';
import { otherSheets } from '../checks/other-sheets';
import { formatHexDouble } from '../checks/format-hex-double';
import { evaluateSubject } from '../expressions/evaluate-subject';
import { parseSubject } from '../expressions/parse-subject';
import type { SubjectExpr } from '../expressions/subject-expr';
import { buildPath } from '../paths/build-path';
import { parseTurns } from '../paths/parse-turns';
import type { PathPoint } from '../paths/path-point';
import { sampleParameters } from '../paths/sample-parameters';
import { BigComplex } from '../reference/complex/big-complex';
import { answerContinue } from '../reference/continuation/answer-continue';
import { FactoredFunction } from '../reference/continuation/factored-function';
import { exp } from '../reference/functions/exp';
import { BigFloat } from '../reference/numbers/big-float';
import { formatDouble } from '../reference/numbers/format-double';
import { parseDouble } from '../reference/numbers/parse-double';
import { parseNumber } from '../reference/numbers/parse-number';
import type { Rational } from '../reference/numbers/rational';
import { FixedTables } from '../reference/real/fixed-tables';
import { CutGeometry, type CutProximity } from './cut-geometry';
import type { ExpectedColumn, Expectation, PointAlternatives } from './expectation';
import type { ReferenceCache } from './reference-cache';
import { rootSheets } from './subject-sheet-family';
import { toPathSpec } from './to-path-spec';
import { formatComplexText } from '../../shared/format-complex-text';
import type { WireComplex } from '../../shared/wire-complex';

type Point = [number, number];

/** Cache kinds: the branch's value at a point, the value continued from the other side of the nearest cut, a refusal marker. */
const KIND_VALUE = 0;
const KIND_OTHER_SIDE = 2;
const KIND_REFUSED = 15;
/** Within this distance (relative to max(1, |z|)) of a cut, the continuation aims at a probe point this far off the cut on the chosen side. */
const PROBE = 1e-6;
/** Within this distance of a cut, a failing point also gets the other side's value as an alternative (straddle offsets go to 1e-3). */
const SIDE_REACH = 2e-3;
/** Working precision of the final product P(z)·C·e^{2πiνk}. */
const BITS = 192;
/** The continuation engine takes at most this many values of t per request. */
const MAX_AT = 1000;

const wireOf = ([re, im]: Point): WireComplex => ({ re: formatHexDouble(re), im: formatHexDouble(im) });
/** A point in messages, sign-exact with ASCII signs: "-1 - 0i", not "-1 + -0i". */
const pointText = ([re, im]: Point): string =>
  formatComplexText({ re: formatDouble(re), im: formatDouble(im) }, { ascii: true });
const exact = (text: string): Rational => {
  const p = parseNumber(text);
  if (p.kind !== 'exact') throw new RangeError(`${text} must be finite`);
  return p.value;
};

/**
 * The expectation of a regular suite: the branch of g(z)^ν fixed by f0 (or k) at z0 on the
 * plane cut along the layout, at each point as a correctly rounded double (to within the
 * reference's bound).
 *
 * Every branch value is C·P(z)·e^{2πiνk} for an integer k, where P is the principal g^ν
 * (evaluated exactly at the point's bits) and C = f0/P(z0) (1 when the branch is given by k).
 * The continuation engine (harness/reference/continuation) decides k: it follows the branch
 * from z0 to the point — once along a whole circle, segment or polyline when it can, else
 * along a straight line (or a bent one around a zero or pole) — and k is the sheet whose value
 * is nearest. Its double-precision answer only has to tell sheets apart; the value itself is
 * the exact product, rounded once.
 *
 * Near a cut (within 1e-6·max(1, |z|)) the continuation aims at a probe point 1e-6 off the cut
 * on the point's side instead, so a point 5e-324 from the cut is not at the mercy of rounding
 * in the crossing test. A point exactly on a cut takes a side by the suite's convention:
 * - signed-zero, on a cut lying on an axis: the sign of the zero part picks the side (+0 above
 *   a cut on the real axis, right of one on the imaginary axis), as Annex G does for principal cuts;
 * - counter-clockwise, or a cut not on an axis: the side reached turning counter-clockwise about
 *   the cut's first point, i.e. the right-hand side walking from that point (Kahan's rule for a
 *   ray from its finite end; for a finite cut the first point as written stands for "its finite end").
 * Output zero signs are not compared: a regular branch does not fix them.
 */
export function regularExpectation(suite: Suite, cache: ReferenceCache, cacheKey: string): Expectation {
  const branch = suite.branch;
  if (branch.kind !== 'regular') throw new TypeError('regularExpectation needs a regular branch');
  const gExpr = parseSubject(branch.g);
  const nuWire: WireComplex = typeof branch.nu === 'string' ? { re: branch.nu, im: '0' } : branch.nu;
  const nuRe = exact(nuWire.re);
  const nuIm = exact(nuWire.im);
  const nuD: [number, number] = [parseDouble(nuWire.re), parseDouble(nuWire.im)];
  const gPow: SubjectExpr = nuIm.isZero()
    ? { kind: 'power', base: gExpr, exponent: nuRe }
    : { kind: 'complexPower', base: gExpr, exponent: { kind: 'const', re: nuRe, im: nuIm } };
  const singular = FactoredFunction.fromSubject(gExpr).singularities();
  const geometry = new CutGeometry(branch);
  const request = {
    g: branch.g,
    nu: branch.nu,
    z0: branch.z0,
    ...(branch.f0 ? { f0: branch.f0 } : { k: branch.k }),
    cuts: branch.cuts,
  };
  const z0: Point = [parseDouble(branch.z0.re), parseDouble(branch.z0.im)];

  // One Ziv round (64 and 112 bits agreeing, ~2^−60 relative): asking for digits would escalate
  // to 8192 bits wherever a part is exactly zero (z^(½+i) at z = 1), since noise never settles.
  // The product below is rounded once, so the double is right except within ~2^−7 ulp of a tie.
  // A part within its error bound of zero is zero: noise of the working precision (~1e-61 where
  // √(x² − 1) is purely imaginary) must not round to a tiny non-zero double.
  const principalPow = (z: BigComplex): BigComplex => {
    const a = evaluateSubject(gPow, z, 'signed-zero', { double: false, digits: 0 }).approximation;
    const settle = (x: BigFloat, err: number) =>
      x.isFinite() && !x.isZero() && err > -Infinity && x.exponent() <= err ? BigFloat.ZERO : x;
    return new BigComplex(settle(a.re, a.reErr), settle(a.im, a.imErr));
  };
  // C = f0 / P(z0), exactly enough; 1 when the branch is named by k (the continuation then carries the k).
  let C: BigComplex | null = null;
  if (branch.f0) {
    const z0Big = new BigComplex(exact(branch.z0.re).toBigFloat(256), exact(branch.z0.im).toBigFloat(256));
    const f0 = new BigComplex(exact(branch.f0.re).toBigFloat(256), exact(branch.f0.im).toBigFloat(256));
    const p0 = principalPow(z0Big);
    const n = p0.norm();
    const num = f0.mul(p0.conj());
    C = new BigComplex(num.re.div(n, BITS), num.im.div(n, BITS));
  }
  const Cd: Point = C ? [C.re.toDouble(), C.im.toDouble()] : [1, 0];

  const twoPi = BigFloat.fromBigInt(FixedTables.pi(BITS + 8), 1 - (BITS + 8));
  const factors = new Map<number, BigComplex>();
  /** e^{2πiνk} at working precision. */
  const factor = (k: number): BigComplex => {
    let f = factors.get(k);
    if (!f) {
      const angle = twoPi.mul(BigFloat.fromBigInt(BigInt(k)));
      const arg = new BigComplex(angle.mul(nuIm.toBigFloat(BITS + 8)).negate(), angle.mul(nuRe.toBigFloat(BITS + 8)));
      f = exp.evaluate(arg, BITS).toComplex();
      // cos and sin of a rational multiple of 2π are either 0 exactly or far above 2^−176 of the
      // modulus; below that a part is rounding noise (sin π ≈ 1e−58) and would leave a tiny
      // non-zero part in a value that is purely real or imaginary.
      const top = Math.max(f.re.exponent(), f.im.exponent());
      const noise = (x: BigFloat) => x.isFinite() && !x.isZero() && x.exponent() < top - (BITS - 16);
      f = new BigComplex(noise(f.re) ? BigFloat.ZERO : f.re, noise(f.im) ? BigFloat.ZERO : f.im);
      factors.set(k, f);
    }
    return f;
  };

  /** The sheet k with C·P·e^{2πiνk} nearest the continued value F. */
  const sheetOf = (F: Point, P: Point, where: string): number => {
    const d: Point = [Cd[0] * P[0] - Cd[1] * P[1], Cd[0] * P[1] + Cd[1] * P[0]];
    const m2 = d[0] * d[0] + d[1] * d[1];
    const rho: Point = [(F[0] * d[0] + F[1] * d[1]) / m2, (F[1] * d[0] - F[0] * d[1]) / m2];
    if (nuIm.isZero()) {
      const a = nuRe.num;
      const b = nuRe.den;
      if (b === 1n) return 0;
      const x = (Math.atan2(rho[1], rho[0]) * Number(b)) / (2 * Math.PI);
      const m = Math.round(x);
      if (Math.abs(x - m) > 0.2 || Math.abs(Math.hypot(...rho) - 1) > 1e-3) {
        throw new Error(
          `the continued value at ${where} is no value of (${branch.g})^(${nuWire.re}) (ratio ${pointText(rho)})`,
        );
      }
      const inv = modInverse(((a % b) + b) % b, b);
      let k = Number((((BigInt(m) * inv) % b) + b) % b);
      if (k > Number(b) / 2) k -= Number(b);
      return k;
    }
    const k = Math.round(-Math.log(Math.hypot(...rho)) / (2 * Math.PI * nuD[1]));
    const f: Point = [
      Math.exp(-2 * Math.PI * nuD[1] * k) * Math.cos(2 * Math.PI * nuD[0] * k),
      Math.exp(-2 * Math.PI * nuD[1] * k) * Math.sin(2 * Math.PI * nuD[0] * k),
    ];
    if (Math.hypot(f[0] - rho[0], f[1] - rho[1]) > 1e-3 * Math.hypot(...f))
      throw new Error(`the continued value at ${where} is no value of the branch (ratio ${pointText(rho)})`);
    return k;
  };

  const continued = new Map<string, Point>();
  /** The branch's value at q by the continuation engine, along z0 → q, bending around zeros and poles when the straight line hits one. */
  const continueTo = (q: Point): Point => {
    const key = `${q[0]},${q[1]}`;
    const known = continued.get(key);
    if (known) return known;
    const span = Math.hypot(q[0] - z0[0], q[1] - z0[1]);
    const mid: Point = [(q[0] + z0[0]) / 2, (q[1] + z0[1]) / 2];
    const normal: Point = span > 0 ? [-(q[1] - z0[1]) / span, (q[0] - z0[0]) / span] : [0, 1];
    const routes: Point[][] = [[]];
    for (const s of [0.3, -0.3, 0.7, -0.7, 1.3])
      routes.push([[mid[0] + s * span * normal[0], mid[1] + s * span * normal[1]]]);
    let lastError = '';
    for (const via of routes) {
      const answer = answerContinue({
        ...request,
        path: { kind: 'polyline', points: [branch.z0, ...via.map(wireOf), wireOf(q)] },
        at: ['1'],
      }) as {
        values?: { f: WireComplex }[];
        error?: string;
      };
      const f = answer.values?.[0]?.f;
      if (f) {
        const v: Point = [Number(f.re), Number(f.im)];
        continued.set(key, v);
        return v;
      }
      lastError = answer.error ?? 'no value';
    }
    throw new Error(`the branch could not be continued to ${pointText(q)}: ${lastError}`);
  };

  /** Continued values at the points of a whole path, by one continuation along it (null when it cannot be done that way). */
  const pathValues = new WeakMap<readonly PathPoint[], (Point | null)[] | null>();
  const alongPath = (path: SuitePath, points: readonly PathPoint[]): (Point | null)[] | null => {
    if (pathValues.has(points)) return pathValues.get(points) ?? null;
    let result: (Point | null)[] | null = null;
    try {
      const ats = continuousAt(path);
      if (ats && ats.length === points.length && ats.length <= MAX_AT) {
        const spec =
          path.kind === 'circle'
            ? {
                kind: 'circle',
                center: path.center,
                radius: path.radius,
                start_angle: String(parseTurns(path.start_angle) * 2 * Math.PI),
                turns: Number(parseDouble(path.turns)),
                direction: path.direction,
              }
            : {
                kind: 'polyline',
                points: path.kind === 'segment' ? [path.from, path.to] : (path as { points: WireComplex[] }).points,
              };
        const answer = answerContinue({ ...request, path: spec, at: ats }) as { values?: { f: WireComplex }[] };
        if (answer.values && answer.values.length === points.length)
          result = answer.values.map((v) => [Number(v.f.re), Number(v.f.im)]);
      }
    } catch {
      result = null;
    }
    pathValues.set(points, result);
    return result;
  };

  const singularAt = (p: Point): string | null => {
    for (const s of singular) {
      if (Math.hypot(p[0] - s.at[0], p[1] - s.at[1]) <= 1e-12 * Math.max(1, Math.hypot(s.at[0], s.at[1]))) {
        return `at a ${s.order > 0 ? 'zero' : 'pole'} of g (${s.at[0]}, ${s.at[1]}), where the branch has no finite non-zero value`;
      }
    }
    return null;
  };

  /** The side (+1 left, −1 right of the edge's direction) a point exactly on a cut belongs to, and why. */
  const sideOnCut = (prox: CutProximity, p: Point): { side: 1 | -1; why: string } => {
    const { a, d } = prox.edge;
    if (suite.convention === 'signed-zero' && d[1] === 0 && a[1] === 0) {
      const up = Object.is(p[1], -0) ? -1 : 1;
      return {
        side: (up * Math.sign(d[0])) as 1 | -1,
        why: `the sign of the zero imaginary part picks the side (signed-zero; ${CUT_CONVENTION_RULE['signed-zero']})`,
      };
    }
    if (suite.convention === 'signed-zero' && d[0] === 0 && a[0] === 0) {
      const right = Object.is(p[0], -0) ? -1 : 1;
      return {
        side: (-right * Math.sign(d[1])) as 1 | -1,
        why: `the sign of the zero real part picks the side (signed-zero; ${CUT_CONVENTION_RULE['signed-zero']})`,
      };
    }
    const reason =
      suite.convention === 'signed-zero'
        ? 'no zero part can pick the side of a cut off the axes, so'
        : 'counter-clockwise continuity (Kahan 1987; ISO/IEC 9899:2011 7.3.3):';
    return {
      side: -1,
      why: `${reason} the cut belongs to the side reached turning counter-clockwise about its first point (the right-hand side walking from it)`,
    };
  };

  /** Which point the continuation aims at for p, on the side wanted (`flip`: the other side of the nearest cut). */
  const aimFor = (p: Point, flip: boolean): { q: Point; prox: CutProximity | null } => {
    const prox = geometry.nearest(p);
    const scale = Math.max(1, Math.hypot(p[0], p[1]));
    if (!prox || prox.distance > (flip ? SIDE_REACH : PROBE) * scale) return { q: p, prox: null };
    const side = (prox.side !== 0 ? prox.side : sideOnCut(prox, p).side) * (flip ? -1 : 1);
    const h = Math.max(prox.distance, PROBE * scale);
    return { q: [prox.foot[0] + side * h * prox.normal[0], prox.foot[1] + side * h * prox.normal[1]], prox };
  };

  const refusals = new Map<string, string>();
  const out = [0, 0];
  /** The value at p (kind 0) or continued from the other side of its nearest cut (kind 2); `along` is the path continuation's value there. */
  const valueAt = (p: Point, kind: number, along: Point | null): Point => {
    if (cache.get(cacheKey, kind, p[0], p[1], out)) return [out[0] as number, out[1] as number];
    if (cache.get(cacheKey, KIND_REFUSED + kind, p[0], p[1], out))
      throw new Error(refusals.get(`${kind}:${p[0]},${p[1]}`) ?? 'the branch has no value here (cached)');
    try {
      if (![p[0], p[1]].every(Number.isFinite)) throw new Error('the branch is checked at finite points only');
      const at = singularAt(p);
      if (at) throw new Error(at);
      const { q, prox } = aimFor(p, kind === KIND_OTHER_SIDE);
      if (kind === KIND_OTHER_SIDE && !prox) throw new Error('not near a cut');
      const F = q === p && along ? along : continueTo(q);
      const P = principalPow(BigComplex.fromDoubles(p[0], p[1]));
      const k = sheetOf(F, [P.re.toDouble(), P.im.toDouble()], pointText(p));
      let f = P.mul(factor(k)).truncate(BITS);
      if (C) f = f.mul(C).truncate(BITS);
      const v: Point = [f.re.toDouble(), f.im.toDouble()];
      cache.put(cacheKey, kind, p[0], p[1], v[0], v[1]);
      return v;
    } catch (e) {
      const message = e instanceof Error ? e.message : String(e);
      refusals.set(`${kind}:${p[0]},${p[1]}`, message);
      cache.put(cacheKey, KIND_REFUSED + kind, p[0], p[1], NaN, NaN);
      throw new Error(message);
    }
  };

  // ASCII signs: this text is also each finding's rule, which the CSV and JUnit outputs carry.
  const text = (w: WireComplex) => formatComplexText(w, { ascii: true });
  const describeBranch = `the regular branch of (${branch.g})^(${nuWire.im === '0' ? nuWire.re : text(nuWire)}) with ${branch.f0 ? `f0 = ${text(branch.f0)}` : `k = ${branch.k}`} at z0 = ${text(branch.z0)}`;
  const sheetKs = nuIm.isZero()
    ? nuRe.den <= 64n
      ? rootSheets(Number(nuRe.den))
      : [-3, -2, -1, 1, 2, 3]
    : [-3, -2, -1, 1, 2, 3];

  return {
    zeroSigns: false,
    description: `${describeBranch}, cut along ${branch.cuts.length} cut(s), ${suite.convention} on the cuts`,
    expected(path: SuitePath, points: readonly PathPoint[]): ExpectedColumn {
      const n = points.length;
      const col: ExpectedColumn = { re: new Float64Array(n), im: new Float64Array(n), skipped: new Map() };
      let along: (Point | null)[] | null | undefined;
      for (let i = 0; i < n; i++) {
        const p: Point = [(points[i] as PathPoint).z.re, (points[i] as PathPoint).z.im];
        try {
          if (!cache.get(cacheKey, KIND_VALUE, p[0], p[1], out)) {
            // Only when something is missing: one continuation along the whole path serves its off-cut points.
            if (along === undefined) along = alongPath(path, points);
            const v = valueAt(p, KIND_VALUE, along?.[i] ?? null);
            out[0] = v[0];
            out[1] = v[1];
          }
          col.re[i] = out[0] as number;
          col.im[i] = out[1] as number;
        } catch (e) {
          col.skipped.set(i, e instanceof Error ? e.message : String(e));
        }
      }
      return col;
    },
    alternatives(
      _path: SuitePath,
      points: readonly PathPoint[],
      index: number,
      expected: ComplexDouble,
    ): PointAlternatives {
      const pp = points[index] as PathPoint;
      const p: Point = [pp.z.re, pp.z.im];
      const alt: PointAlternatives = {
        rule: `${describeBranch}, continued from z0 to z on the plane cut along the layout (DESIGN.md §4)`,
      };
      const tryValue = (x: Point, kind: number): Point | null => {
        try {
          return valueAt(x, kind, null);
        } catch {
          return null;
        }
      };
      if (suite.convention === 'signed-zero' && (p[0] === 0 || p[1] === 0)) {
        const part = p[1] === 0 ? 'im' : 're';
        const flipped = tryValue(part === 'im' ? [p[0], -p[1]] : [-p[0], p[1]], KIND_VALUE);
        if (flipped) alt.flippedZero = { part, value: flipped };
      }
      const prox = geometry.nearest(p);
      const scale = Math.max(1, Math.hypot(p[0], p[1]));
      if (prox && prox.distance <= SIDE_REACH * scale) {
        const other = tryValue(p, KIND_OTHER_SIDE);
        if (other) alt.otherSide = other;
        if (prox.side === 0 && other) {
          const { side, why } = sideOnCut(prox, p);
          const [dx, dy] = prox.edge.d;
          const [left, right] =
            dy === 0
              ? dx > 0
                ? ['above', 'below']
                : ['below', 'above']
              : dx === 0
                ? dy > 0
                  ? ['the left', 'the right']
                  : ['the right', 'the left']
                : ['the left (walking from its first point)', 'the right'];
          const values: [ComplexDouble, ComplexDouble] = side === 1 ? [expected, other] : [other, expected];
          alt.limits = {
            sides: [`from ${left} of cut ${prox.edge.cut}`, `from ${right} of cut ${prox.edge.cut}`],
            values,
          };
          alt.rule += `; z lies on cut ${prox.edge.cut}: ${why}`;
        } else if (prox.side !== 0) {
          alt.rule += `; z lies ${prox.distance} from cut ${prox.edge.cut}, on its ${prox.side === 1 ? 'left' : 'right'}-hand side walking from its first point`;
        }
      }
      alt.otherSheets = otherSheets({ kind: 'power', nu: nuD, ks: sheetKs, sign: 1 }, expected);
      return alt;
    },
    monodromy(path: SuitePath): { factor: ComplexDouble; nu: [number, number] } | null {
      let spec: Record<string, unknown> | null = null;
      if (path.kind === 'circle') {
        const turns = parseDouble(path.turns);
        if (Number.isInteger(turns) && turns > 0 && turns <= 64) {
          spec = {
            kind: 'circle',
            center: path.center,
            radius: path.radius,
            start_angle: String(parseTurns(path.start_angle) * 2 * Math.PI),
            turns,
            direction: path.direction,
          };
        }
      } else if (path.kind === 'polyline') {
        const first = path.points[0] as WireComplex;
        const last = path.points[path.points.length - 1] as WireComplex;
        if (parseDouble(first.re) === parseDouble(last.re) && parseDouble(first.im) === parseDouble(last.im))
          spec = { kind: 'polyline', points: path.points };
      }
      if (!spec) return null;
      // The loop's monodromy does not depend on where the branch was fixed, so the continuation
      // starts on the loop itself: a lead-in from z0 could pass through a zero or pole.
      const start = buildPath(toPathSpec(path))[0] as PathPoint;
      const answer = answerContinue({
        g: branch.g,
        nu: branch.nu,
        z0: wireOf([start.z.re, start.z.im]),
        k: 0,
        path: spec,
        at: ['1'],
      }) as {
        monodromy?: WireComplex | null;
        error?: string;
      };
      if (!answer.monodromy) {
        if (answer.error) throw new Error(`monodromy along ${path.name}: ${answer.error}`);
        return null;
      }
      return { factor: [Number(answer.monodromy.re), Number(answer.monodromy.im)], nu: nuD };
    },
  };
}

/** The values of t of a continuous path as exact strings for the continuation engine, or null for other kinds. */
function continuousAt(path: SuitePath): string[] | null {
  if (path.kind !== 'circle' && path.kind !== 'segment' && path.kind !== 'polyline') return null;
  if (path.at !== undefined) return path.at;
  const n = path.samples as number;
  if (n === 1) return ['0'];
  return sampleParameters({ samples: n }).map((_, i) => `${i}/${n - 1}`);
}

function modInverse(a: bigint, m: bigint): bigint {
  let [r0, r1] = [a, m];
  let [s0, s1] = [1n, 0n];
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  if (r0 !== 1n) throw new RangeError(`${a} has no inverse mod ${m}`);
  return ((s0 % m) + m) % m;
}
