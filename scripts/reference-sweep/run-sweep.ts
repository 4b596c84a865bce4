import { answerReference } from '../../harness';
import type { ReferenceAnswer } from '../../shared/reference-answer';
import { cpuMilliseconds } from './cpu-milliseconds';
import type { SweepInput } from './sweep-inputs';

/** One answer of the sweep that broke a rule, with the request that produced it. */
export interface SweepProblem {
  input: SweepInput;
  answer: ReferenceAnswer;
  rule: 'error answer' | 'NaN for a finite value' | 'rounding left undecided';
}

/** A value's time: its first answer, and its fastest warm answer when the first passed the bound. */
export interface SweepTiming {
  input: SweepInput;
  firstMs: number;
  warmMs: number;
}

/** What a sweep found: counts, the problems, the slowest values, every answer and the wall time. */
export interface SweepFigures {
  count: number;
  errors: number;
  nans: number;
  undecided: number;
  problems: SweepProblem[];
  /** The slowest values by warm time, slowest first. */
  slowest: SweepTiming[];
  /** The slowest first answer, tables of constants for a new precision included. */
  slowestFirst: SweepTiming | null;
  answers: ReferenceAnswer[];
  wallMs: number;
}

/** Issue 12's bound on one reference value. */
export const VALUE_BOUND_MS = 50;
const KEEP_SLOWEST = 5;
/**
 * A value past the bound is answered up to this many times more and the fastest counts: other
 * work on the shared 2-core machine only ever adds time (a jest run beside another slice once
 * took a 33 ms value past 50 ms).
 */
const WARM_RUNS = 3;

/**
 * Answers every request as `sheetkeeper reference` does (answerReference: the double and 40
 * digits), timing each, and counts error answers, NaN parts (every sweep input is finite and
 * none is 0^(iy), so the catalogue's functions give finite or infinite values, never NaN) and
 * answers whose rounding the precision cap left undecided. A value whose first answer passes
 * {@link VALUE_BOUND_MS} is answered again (the fastest of up to {@link WARM_RUNS} runs) and that
 * warm time is what the bound applies to: the
 * first use of a new working precision builds its tables of constants (π, ln 2, the exp/log/sin
 * tables) once per process, which the slowest first answer reports apart.
 */
export function runSweep(inputs: readonly SweepInput[]): SweepFigures {
  const figures: SweepFigures = {
    count: inputs.length,
    errors: 0,
    nans: 0,
    undecided: 0,
    problems: [],
    slowest: [],
    slowestFirst: null,
    answers: [],
    wallMs: 0,
  };
  const start = performance.now();
  for (const input of inputs) {
    const request = { fn: input.fn, z: input.z, w: input.w, n: input.n, convention: input.convention };
    let answer!: ReferenceAnswer;
    const firstMs = cpuMilliseconds(() => (answer = answerReference(request)));
    let warmMs = firstMs;
    for (let again = 0; again < WARM_RUNS && warmMs > VALUE_BOUND_MS; again++) {
      warmMs = Math.min(
        warmMs,
        cpuMilliseconds(() => answerReference(request)),
      );
    }
    figures.answers.push(answer);
    const rule = problemOf(answer);
    if (rule) {
      figures.problems.push({ input, answer, rule });
      if (rule === 'error answer') figures.errors += 1;
      else if (rule === 'NaN for a finite value') figures.nans += 1;
      else figures.undecided += 1;
    }
    const timing = { input, firstMs, warmMs };
    if (!figures.slowestFirst || firstMs > figures.slowestFirst.firstMs) figures.slowestFirst = timing;
    if (figures.slowest.length < KEEP_SLOWEST || warmMs > (figures.slowest.at(-1)?.warmMs ?? 0)) {
      figures.slowest.push(timing);
      figures.slowest.sort((a, b) => b.warmMs - a.warmMs);
      figures.slowest.length = Math.min(figures.slowest.length, KEEP_SLOWEST);
    }
  }
  figures.wallMs = performance.now() - start;
  return figures;
}

function problemOf(answer: ReferenceAnswer): SweepProblem['rule'] | null {
  if ('error' in answer) return 'error answer';
  if (answer.double.re === 'nan' || answer.double.im === 'nan') return 'NaN for a finite value';
  if (answer.warning !== undefined) return 'rounding left undecided';
  return null;
}
