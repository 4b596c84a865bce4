import type { StepValue } from '../../../shared/run-result';
import { checkValue } from '../../checks/check-value';
import type { ComplexDouble } from '../../checks/complex-double';
import { evaluateSubject } from '../../expressions/evaluate-subject';
import type { SubjectExpr } from '../../expressions/subject-expr';
import type { Approximation } from '../../reference/complex/approximation';
import { BigComplex } from '../../reference/complex/big-complex';
import { reciprocalAtZeroChoice } from '../../reference/functions/reciprocal-at-zero-choice';
import { listedPoints } from './listed-points';
import type { PathRun } from './path-run';
import type { ProgramStep } from './subject-program';
import type { ValueColumn } from './value-column';
import { wireDouble } from './wire-double';

type OpStep = Extract<ProgramStep, { kind: 'op' }>;

/**
 * Failing points traced per path at most: a trace is one reference evaluation of the subject,
 * 2.3–4.5 ms each on the demo catalogue (171 points in 400–763 ms, load average 15–20), so a path
 * of 100,000 failures stored by the server (which lists them all) costs at most ~2–5 s more,
 * well inside the 120 s limit of a shard. Points beyond it are listed without steps.
 */
const TRACE_LIMIT = 1000;

/**
 * Complex + − × ÷ and negation: the zero signs of their exact zeros follow the formula a library
 * uses, not a standard ((−1.5 − 0i)/(0.5 + 0i) is −3 + 0i through a·conj(b)/|b|², as the
 * reference computes it, and −3 − 0i dividing each part by the real divisor, as complex.js does),
 * so such a step has not left the reference by a zero's sign alone.
 */
const ARITHMETIC = new Set(['add', 'sub', 'mul', 'div', 'neg']);

const toDouble = (a: Approximation): ComplexDouble => [a.re.toDouble(), a.im.toDouble()];

/**
 * For the failing points of a suite, what the reference says about each step the library took:
 * a composed subject's intermediate values (the library's, from evaluateProgram's step columns,
 * beside the reference's value of the same sub-expression at the same input, from the one walk of
 * evaluate-subject.ts) with the first step that left the reference, and, for any subject, the
 * choice the expected value rests on where conventions disagree (reciprocal-at-zero-choice.ts).
 * A step has left when its value fails the suite's value tolerance against the reference's, or a
 * function's zero part has the other sign: the sign of an intermediate zero picks the side of the
 * next function's cut whatever the suite's convention (arithmetic's zero signs: ARITHMETIC).
 *
 * A point whose first step to leave came before the last and left through a part the reference
 * has as an exact zero (the library's is not zero, or is a zero of the other sign) goes into
 * `run.zeroLostBefore`: the zero the input carried was lost by that step, not misread by the
 * last one (diagnose-failures.ts). A step that returns f at its argument with the zero flipped
 * (√(−1.8 − 0i) = +1.34i) keeps the input's zero-sign story.
 *
 * In a regular suite the inner steps are principal values, as the library computes them, and the
 * last step's reference is the expected value: the branch continued along the cut plane.
 *
 * Cost: one reference evaluation of the whole subject per traced point, as the expected value
 * took (the expected value may have come from the cache, these do not). Called twice: in phase
 * `labels`, before the diagnosis, for the failures on an axis under signed zeros, whose label
 * depends on the steps; in phase `listed`, once the labels are final, for the listed failures
 * (listed-points.ts), up to TRACE_LIMIT a path in all; the others are counted under their label
 * without steps.
 */
export function traceSteps(run: PathRun, phase: 'labels' | 'listed'): void {
  if (run.failing.length === 0) return;
  const principal = run.suite.branch.kind === 'principal';
  const steps = run.program.steps;
  const ops = steps.flatMap((s, k) => (s.kind === 'op' ? [k] : []));
  const last = steps[steps.length - 1] as ProgramStep;
  if (ops.length === 0 || last.kind !== 'op') return;
  const root = last.node;
  const composed = ops.length > 1;
  const columns = run.actual.steps ?? [];
  const tol = run.suite.tolerances.values;
  const { re, im } = run.inputs;
  const signedZero = run.suite.convention === 'signed-zero';
  const onAxis = (i: number) => composed && signedZero && (re[i] === 0 || im[i] === 0);
  // Before the diagnosis: the failures whose label depends on the steps (diagnose-failures.ts).
  // Once the labels are final: the listed failures not traced yet (listed-points.ts). Composed
  // subjects at most TRACE_LIMIT a path; a single call only looks for a choice, which costs nothing.
  const candidates =
    phase === 'labels'
      ? run.failing.filter(onAxis)
      : listedPoints(run).filter((i) => run.outcomes[i]?.kind === 'fail' && !run.traces.has(i));
  const room = composed ? Math.max(0, TRACE_LIMIT - run.traces.size) : candidates.length;
  for (const i of candidates.slice(0, room)) {
    if (run.signal?.aborted) return;
    const z = BigComplex.fromDoubles(re[i] as number, im[i] as number);
    if (!composed) {
      const choice = reciprocalAtZeroChoice(last.op, z);
      if (choice) run.traces.set(i, { choice });
      continue;
    }
    const nodes = new Map<SubjectExpr, Approximation>();
    try {
      evaluateSubject(root, z, run.suite.convention, { double: true, digits: 0 }, nodes);
    } catch {
      // The reference has no value here: the point was skipped, not failed; nothing to trace.
      continue;
    }
    const values: StepValue[] = [];
    let firstLeftStep: number | undefined;
    let choice: string | null = null;
    for (const k of ops) {
      const step = steps[k] as OpStep;
      const col = columns[k] as ValueColumn | undefined;
      const ref = nodes.get(step.node);
      const library: ComplexDouble | null = col ? [col.re[i] as number, col.im[i] as number] : null;
      const reference: ComplexDouble | null =
        !principal && step === last
          ? run.expected.skipped.has(i)
            ? null
            : [run.expected.re[i] as number, run.expected.im[i] as number]
          : ref
            ? toDouble(ref)
            : null;
      const arithmetic = ARITHMETIC.has(step.op);
      const left = library !== null && reference !== null && !checkValue(library, reference, tol, !arithmetic).pass;
      if (left && firstLeftStep === undefined) {
        firstLeftStep = values.length;
        if (step !== last && lostZero(library, reference, arithmetic)) run.zeroLostBefore.add(i);
      }
      values.push({
        text: step.text,
        library: library && wireDouble(library),
        reference: reference && wireDouble(reference),
        left,
      });
      const arg = argumentOf(step.node);
      const argValue = arg && nodes.get(arg);
      choice ??= argValue ? reciprocalAtZeroChoice(step.op, argValue.toComplex()) : null;
    }
    run.traces.set(i, {
      steps: values,
      ...(firstLeftStep === undefined ? {} : { firstLeftStep }),
      ...(choice ? { choice } : {}),
    });
  }
}

/** A part the reference has as an exact zero is not zero in the library's value, or (for a function) a zero of the other sign. */
function lostZero(library: ComplexDouble, reference: ComplexDouble, arithmetic: boolean): boolean {
  return [0, 1].some(
    (p) => reference[p] === 0 && (arithmetic ? library[p] !== 0 : !Object.is(library[p], reference[p])),
  );
}

/** The argument of a one-argument function call, whose zero is where a reciprocal function's value is a choice. */
function argumentOf(node: SubjectExpr): SubjectExpr | null {
  return node.kind === 'call' ? node.arg : null;
}
