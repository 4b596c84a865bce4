import { lerpComponent } from '../../paths/lerp-component';
import type { PathPoint } from '../../paths/path-point';
import { evaluateProgram } from './evaluate-program';
import type { PathRun } from './path-run';

/**
 * Bisection levels at most: 2^−40 ≈ 9e−13 of the step between two samples, below which a steep
 * continuous stretch of a double-valued function cannot be told from a jump anyway.
 */
const LEVELS = 40;
/** A jump stays when the bracketing half still holds at least this part of the first step's change. */
const KEEP = 0.5;
/** …and the side that did not jump changes at most this part of it there. */
const STAYS_LARGER = 2;

/** Values along a path column-wise, NaN where missing (compare-along-path.ts). */
interface Columns {
  expected: readonly [Float64Array, Float64Array];
  library: readonly [Float64Array, Float64Array];
}

interface Bracket {
  step: number;
  /** Which side jumped between the samples: the library's values or the expected ones. */
  jumping: 'library' | 'expected';
  from: { re: number; im: number };
  to: { re: number; im: number };
  /** Bracket ends in s ∈ [0, 1] along the chord between the two samples, with both sides' values there. */
  a: number;
  b: number;
  libA: [number, number];
  libB: [number, number];
  expA: [number, number];
  expB: [number, number];
  /** The jumping side's change over the whole step. */
  first: number;
  done: boolean;
}

const change = (p: [number, number], q: [number, number]): number => Math.hypot(q[0] - p[0], q[1] - p[1]);

/**
 * Which of the steps where the library's values and the expected values disagree about a jump
 * (detect-jumps.ts) really hold a jump of one side only. Between the two samples of each step it
 * bisects the chord from one sample to the other (lerp-component.ts, zero signs kept), evaluating
 * the subject through the target and the expected value at each midpoint, and keeps the half
 * where the side that jumped changes more. A jump is confirmed when, after LEVELS halvings (or
 * when the midpoint is no longer a new double), that side's change over the bracket is still at
 * least half its change over the whole step and more than twice the other side's change over the
 * same bracket. A steep but continuous stretch fails the first test once the bracket is narrower
 * than the stretch: its change shrinks with the bracket.
 *
 * Bounded: at most LEVELS rounds, each one batched call of the program for all steps still open
 * and one expected value per step. A step whose values go missing (an error, a skipped reference,
 * a cancelled run) is not confirmed.
 */
export async function confirmJumps(
  run: PathRun,
  steps: readonly number[],
  jumps: { expected: ArrayLike<number>; actual: ArrayLike<number> },
  columns: Columns,
): Promise<Set<number>> {
  const confirmed = new Set<number>();
  const at = (c: readonly [Float64Array, Float64Array], i: number): [number, number] => [
    c[0][i] as number,
    c[1][i] as number,
  ];
  const brackets: Bracket[] = [];
  for (const step of new Set(steps)) {
    const p = run.points[step] as PathPoint;
    const q = run.points[step + 1] as PathPoint;
    const jumping = jumps.actual[step] ? 'library' : 'expected';
    const libA = at(columns.library, step);
    const libB = at(columns.library, step + 1);
    const expA = at(columns.expected, step);
    const expB = at(columns.expected, step + 1);
    const first = jumping === 'library' ? change(libA, libB) : change(expA, expB);
    if (!Number.isFinite(first) || !Number.isFinite(change(libA, libB) + change(expA, expB))) continue;
    brackets.push({
      step,
      jumping,
      from: p.z,
      to: q.z,
      a: 0,
      b: 1,
      libA,
      libB,
      expA,
      expB,
      first,
      done: false,
    });
  }
  for (let level = 0; level < LEVELS; level++) {
    const open = brackets.filter((k) => !k.done);
    if (open.length === 0 || run.signal?.aborted) break;
    const mids: PathPoint[] = [];
    const splitting: Bracket[] = [];
    for (const k of open) {
      const s = (k.a + k.b) / 2;
      const z = { re: lerpComponent(k.from.re, k.to.re, s), im: lerpComponent(k.from.im, k.to.im, s) };
      const zA = { re: lerpComponent(k.from.re, k.to.re, k.a), im: lerpComponent(k.from.im, k.to.im, k.a) };
      const zB = { re: lerpComponent(k.from.re, k.to.re, k.b), im: lerpComponent(k.from.im, k.to.im, k.b) };
      const same = (u: { re: number; im: number }) => Object.is(u.re, z.re) && Object.is(u.im, z.im);
      if (same(zA) || same(zB)) {
        // No double between the two ends: decide on the bracket as it is.
        k.done = true;
        continue;
      }
      mids.push({ t: s, z });
      splitting.push(k);
    }
    if (splitting.length === 0) break;
    const expected = run.expectation.expected(run.path, mids);
    const library = await evaluateProgram(
      run.program,
      run.target,
      Float64Array.from(mids, (m) => m.z.re),
      Float64Array.from(mids, (m) => m.z.im),
      run.signal,
      run.entry.name,
    );
    splitting.forEach((k, j) => {
      if (expected.skipped.has(j) || library.errors.has(j)) {
        k.done = true;
        k.first = Infinity;
        return;
      }
      const s = (k.a + k.b) / 2;
      const lib: [number, number] = [library.re[j] as number, library.im[j] as number];
      const exp: [number, number] = [expected.re[j] as number, expected.im[j] as number];
      const side = k.jumping === 'library' ? [k.libA, lib, k.libB] : [k.expA, exp, k.expB];
      const left = change(side[0] as [number, number], side[1] as [number, number]);
      const right = change(side[1] as [number, number], side[2] as [number, number]);
      if (left >= right) {
        k.b = s;
        k.libB = lib;
        k.expB = exp;
      } else {
        k.a = s;
        k.libA = lib;
        k.expA = exp;
      }
      // Shrinking with the bracket: continuous, however steep; no need to go on.
      if (Math.max(left, right) < KEEP * k.first) k.done = true;
    });
  }
  for (const k of brackets) {
    const lib = change(k.libA, k.libB);
    const exp = change(k.expA, k.expB);
    const [jumped, other] = k.jumping === 'library' ? [lib, exp] : [exp, lib];
    if (jumped >= KEEP * k.first && jumped > STAYS_LARGER * other) confirmed.add(k.step);
  }
  return confirmed;
}
