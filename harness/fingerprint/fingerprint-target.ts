import type {
  ConventionFingerprint,
  FingerprintDisagreement,
  FingerprintSide,
} from '../../shared/convention-fingerprint';
import { formatComplexText } from '../../shared/format-complex-text';
import type { ComplexPair } from '../adapters/complex-pair';
import { findEntry } from '../adapters/find-entry';
import type { Target } from '../adapters/target';
import { relativeError } from '../checks/relative-error';
import type { PlaneCut } from '../cuts/plane-cut';
import { buildPath } from '../paths/build-path';
import type { PathPoint } from '../paths/path-point';
import { formatDouble } from '../reference/numbers/format-double';
import type { FingerprintFunction } from './fingerprint-function';
import { FINGERPRINT_FUNCTIONS } from './fingerprint-functions';
import { referenceValue } from './reference-value';

type CutEntry = ConventionFingerprint['cuts'][number];
type Probe = CutEntry['probes'][number];

/**
 * Two values are the same side of a cut when they agree to 1e-6 relative: the two sides differ
 * by O(1) (a conjugate, ±2πi), while libraries that are merely inaccurate near a cut were seen
 * up to ~1e-10 off (complex.js acos at 2 ± 0i).
 */
const SAME = 1e-6;
/** "Just off" the cut: far enough that every double part changes, near enough to see the one-sided limit. */
const OFF = '1e-9';
/**
 * Distances along a ray from its finite end; fractions along a finite cut, chosen to miss the
 * branch points and 0 (the middle of acot's cut [−i, i], where 1/z is infinite). Places stay
 * within 100 of the end: further out, complex.js 2.0.11's asin was off by more than 1e-6 at
 * 1e6 — an accuracy finding, not a convention.
 */
const ALONG_RAY = ['0.5', '1', '3', '100'];
const ALONG_SEGMENT = ['0.2', '0.4', '0.7', '0.9'];

const wire = ([re, im]: ComplexPair) => ({ re: formatDouble(re), im: formatDouble(im) });
const same = (a: ComplexPair | null, b: ComplexPair): boolean => a !== null && relativeError(a, b) <= SAME;

function straddle(cut: PlaneCut): PathPoint[] {
  const geometry = (p: ComplexPair) => ({ re: p[0], im: p[1] });
  return buildPath({
    kind: 'straddle',
    cut: cut.toInfinity
      ? { kind: 'ray', from: geometry(cut.from), through: geometry(cut.to) }
      : { kind: 'segment', from: geometry(cut.from), to: geometry(cut.to) },
    along: cut.toInfinity ? ALONG_RAY : ALONG_SEGMENT,
    offsets: [OFF],
  });
}

/**
 * The convention fingerprint of one target (shared/convention-fingerprint.ts). For each
 * function and each of its cuts (from the reference catalogue), at a few places along the
 * cut (straddle paths: exactly on it with +0 and with −0 in the across part, and 1e-9 off it on
 * both sides), the target's values are compared with the reference under signed-zero and under
 * counter-clockwise. A place votes `signed-zero` when +0 and −0 give the two Annex G values,
 * `counter-clockwise` when both give Kahan's value, `neither` otherwise — and also when a value
 * just off the cut differs from the principal branch (then the cut is not where the function
 * has it, and what happens on it says nothing about a convention). Functions sharing a cut are
 * then compared. Every value is built through one entry (the default: the library's constructor
 * from two numbers), so a constructor that drops −0 shows here as a user of it meets it.
 */
export async function fingerprintTarget(
  target: Target,
  functions: readonly FingerprintFunction[] = FINGERPRINT_FUNCTIONS,
  /** The entry values are built through (shared/target-entry.ts); absent, the target's default. */
  entryName?: string,
): Promise<ConventionFingerprint> {
  const found = findEntry(target, entryName);
  if (found instanceof Error) throw found;
  const way = found;
  const missing: string[] = [];
  const cuts: CutEntry[] = [];
  const functionOf = new Map<CutEntry, FingerprintFunction>();
  let points = 0;
  for (const fn of functions) {
    if (!(await target.supports(fn.op))) {
      missing.push(fn.label);
      continue;
    }
    for (const cut of fn.cuts) {
      const path = straddle(cut);
      const answers = await target.evaluate(
        fn.op,
        path.map((p) => [[p.z.re, p.z.im] as ComplexPair, ...fn.extra]),
        way.name,
      );
      points += path.length;
      const value = (i: number): ComplexPair | null => {
        const a = answers[i]!;
        return 'value' in a ? a.value : null;
      };
      const errorAt = (i: number): string | null => {
        const a = answers[i]!;
        return 'error' in a ? a.error : null;
      };
      const probes: Probe[] = [];
      for (const t of [...new Set(path.map((p) => p.t))]) {
        const at = (label: string): number => path.findIndex((p) => p.t === t && p.label === label);
        const [plus, minus] = [at('on +0'), at('on -0')];
        const off = path.flatMap((p, i) => (p.t === t && p.label !== 'on +0' && p.label !== 'on -0' ? [i] : []));
        if (plus < 0 || minus < 0) continue;
        const z = (i: number): ComplexPair => [path[i]!.z.re, path[i]!.z.im];
        const ref = (i: number, convention: 'signed-zero' | 'counter-clockwise') =>
          referenceValue(fn.op, [z(i), ...fn.extra], convention);
        const [szPlus, szMinus, ccw] = [
          ref(plus, 'signed-zero'),
          ref(minus, 'signed-zero'),
          ref(plus, 'counter-clockwise'),
        ];
        // Where the two Annex G values agree (a finite end of the cut), the place tells the conventions apart by nothing.
        if (relativeError(szPlus, szMinus) <= SAME) continue;
        const [vPlus, vMinus] = [value(plus), value(minus)];
        const probe: Probe = {
          at: wire(z(plus)),
          verdict: 'neither',
          plusZero: vPlus && wire(vPlus),
          minusZero: vMinus && wire(vMinus),
        };
        const failedCall = [plus, minus, ...off].map(errorAt).find((e) => e !== null);
        const offWrong = off.find((i) => !same(value(i), ref(i, 'signed-zero')));
        if (failedCall) probe.note = `no value: ${failedCall}`;
        else if (offWrong !== undefined) {
          const w = path[offWrong]!.z;
          probe.note = `just off the cut, at ${formatComplexText(wire([w.re, w.im]), { ascii: true })}, the value is not the principal one: the cut is elsewhere here, or the value is inaccurate`;
        } else if (same(vPlus, szPlus) && same(vMinus, szMinus)) probe.verdict = 'signed-zero';
        else if (same(vPlus, ccw) && same(vMinus, ccw)) probe.verdict = 'counter-clockwise';
        else if (same(vPlus, szMinus) && same(vMinus, szPlus))
          probe.note = '+0 and -0 give the sides the other way round';
        else if (vMinus !== null && same(vPlus, vMinus))
          probe.note = 'both zero signs give the limit from the side the counter-clockwise rule leaves open';
        else probe.note = 'the values on the cut are neither one-sided limit';
        probes.push(probe);
      }
      const verdicts = new Set(probes.map((p) => p.verdict));
      const alone: CutEntry['alone'] =
        verdicts.size === 1 ? [...verdicts][0]! : verdicts.size === 0 ? 'neither' : 'inconsistent';
      const entry: CutEntry = {
        function: fn.label,
        cut: cut.label,
        behaviour: alone,
        alone,
        disagreesWith: [],
        probes,
      };
      functionOf.set(entry, fn);
      cuts.push(entry);
    }
  }
  for (const entry of cuts) {
    if (entry.alone !== 'signed-zero' && entry.alone !== 'counter-clockwise') continue;
    const other = entry.alone === 'signed-zero' ? 'counter-clockwise' : 'signed-zero';
    const others = cuts.filter((e) => e.cut === entry.cut && e.alone === other);
    entry.disagreesWith = others.map((e) => e.function);
    if (others.length > 0) {
      entry.behaviour = 'inconsistent';
      entry.disagreements = others.flatMap((o) => {
        const d = disagreementPoint(entry, o, functionOf);
        return d ? [d] : [];
      });
    }
  }
  return {
    target: target.name,
    entry: way.name,
    statement:
      `Evidence at ${points} points, every value built through the ${way.name} entry (${way.call}): on each cut at the places listed, exactly on it with +0 and -0 and ${OFF} off it on both sides, ` +
      `compared with the reference to a relative ${SAME.toExponential()}. It says which side each zero sign selects there; it is not a check of accuracy ` +
      `and not a certification of the library elsewhere on the cut or off it. Functions sharing a cut are compared only among the ` +
      `${functions.length - missing.length} fingerprinted here.`,
    missing,
    cuts,
  };
}

/**
 * Where `entry` and `other` (same cut, opposite conventions) part ways: the first place both voted
 * their own convention at; for each function, its value there at the zero sign where its two
 * conventions give different values (the side counter-clockwise continuity leaves open, which is
 * not the same side for every function on a cut: log's is below (−∞, 0], asech's above), with
 * both of its references.
 */
function disagreementPoint(
  entry: CutEntry,
  other: CutEntry,
  functionOf: ReadonlyMap<CutEntry, FingerprintFunction>,
): FingerprintDisagreement | null {
  const fn = functionOf.get(entry);
  const otherFn = functionOf.get(other);
  if (!fn || !otherFn) return null;
  const place = entry.probes.find(
    (p) =>
      p.verdict === entry.alone &&
      other.probes.some((q) => q.verdict === other.alone && q.at.re === p.at.re && q.at.im === p.at.im),
  );
  if (!place) return null;
  const otherPlace = other.probes.find((q) => q.at.re === place.at.re && q.at.im === place.at.im) as Probe;
  const plus: ComplexPair = [Number(place.at.re), Number(place.at.im)];
  // The across part is the zero one (probes are written with +0 there); its −0 twin is the other side.
  const minus: ComplexPair = plus[1] === 0 ? [plus[0], -0] : [-0, plus[1]];
  const side = (f: FingerprintFunction, probe: Probe): FingerprintSide => {
    const ref = (z: ComplexPair, c: 'signed-zero' | 'counter-clockwise') => referenceValue(f.op, [z, ...f.extra], c);
    const atPlus = !same(ref(plus, 'signed-zero'), ref(plus, 'counter-clockwise'));
    const z = atPlus ? plus : minus;
    const value = atPlus ? probe.plusZero : probe.minusZero;
    const [sz, ccw] = [ref(z, 'signed-zero'), ref(z, 'counter-clockwise')];
    const v: ComplexPair | null = value ? [Number(value.re), Number(value.im)] : null;
    return {
      function: f.label,
      at: wire(z),
      value,
      reference: { 'signed-zero': wire(sz), 'counter-clockwise': wire(ccw) },
      follows: same(v, sz) ? 'signed-zero' : same(v, ccw) ? 'counter-clockwise' : null,
    };
  };
  return { with: other.function, at: place.at, sides: [side(fn, place), side(otherFn, otherPlace)] };
}
