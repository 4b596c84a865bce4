import type { ComplexPair } from '../../adapters/complex-pair';
import type { Target } from '../../adapters/target';
import type { SubjectProgram } from './subject-program';
import type { ValueColumn } from './value-column';

/** Calls per batch: the cmath adapter answers 1000 calls in ~15 ms (stdio-target.ts), so a batch stays well under a second. */
const BATCH = 2048;

/**
 * A subject evaluated at many points with the target's own operations, one batch per step and
 * up to 2048 calls per batch. A call that fails makes that point an error naming the operation;
 * the other points go on. Between batches it checks `signal`: once aborted, the points not yet
 * evaluated get the abort reason as their error and no more calls are made.
 *
 * The input is built through `entry` (shared/target-entry.ts) and never patched afterwards. An
 * in-process library's values stay its own between steps (column-args.ts), as in a user's code;
 * a stdio library's come back as exact parts and each step builds its arguments again through
 * the same entry (docs/stdio-protocol.md).
 */
export async function evaluateProgram(
  program: SubjectProgram,
  target: Target,
  re: Float64Array,
  im: Float64Array,
  signal?: AbortSignal,
  /** The target's entry to build the input with (docs/suite-format.md); absent: the target's default. */
  entry?: string,
): Promise<ValueColumn> {
  const n = re.length;
  const errors = new Map<number, string>();
  const columns: (ValueColumn | ComplexPair)[] = [];
  const abortMessage = (): string =>
    signal?.reason instanceof Error ? signal.reason.message : String(signal?.reason ?? 'cancelled');
  let result: ValueColumn = { re, im, errors };
  // A step's library values are kept only where a later step takes them as an argument.
  const takenLater = new Set(program.steps.flatMap((s) => (s.kind === 'op' ? s.args : [])));
  for (const [index, step] of program.steps.entries()) {
    if (step.kind === 'input') {
      columns.push({ re, im, errors });
      continue;
    }
    if (step.kind === 'const') {
      columns.push(step.value);
      continue;
    }
    const args = step.args.map((i) => columns[i] as ValueColumn | ComplexPair);
    if (target.evaluateColumns && !signal?.aborted) {
      // In-process libraries answer column-wise: no array per call (bench:harness).
      const answer = await target.evaluateColumns(step.op, args, n, errors, entry, takenLater.has(index));
      for (const [i, message] of answer.errors) if (!errors.has(i)) errors.set(i, `${step.op}: ${message}`);
      const col: ValueColumn = { re: answer.re, im: answer.im, errors, values: answer.values };
      columns.push(col);
      result = col;
      continue;
    }
    const out: ValueColumn = { re: new Float64Array(n), im: new Float64Array(n), errors };
    const argAt = (a: ValueColumn | ComplexPair, i: number): ComplexPair =>
      Array.isArray(a) ? (a as ComplexPair) : [(a as ValueColumn).re[i] as number, (a as ValueColumn).im[i] as number];
    for (let start = 0; start < n; start += BATCH) {
      const end = Math.min(n, start + BATCH);
      if (signal?.aborted) {
        for (let i = start; i < n; i++) if (!errors.has(i)) errors.set(i, abortMessage());
        break;
      }
      const calls: ComplexPair[][] = [];
      const where: number[] = [];
      for (let i = start; i < end; i++) {
        if (errors.has(i)) continue;
        calls.push(args.map((a) => argAt(a, i)));
        where.push(i);
      }
      if (calls.length === 0) continue;
      const answers = await target.evaluate(step.op, calls, entry);
      for (let k = 0; k < where.length; k++) {
        const i = where[k] as number;
        const a = answers[k];
        if (!a) errors.set(i, `${step.op}: no answer`);
        else if ('error' in a) errors.set(i, `${step.op}: ${a.error}`);
        else {
          out.re[i] = a.value[0];
          out.im[i] = a.value[1];
        }
      }
    }
    columns.push(out);
    result = out;
  }
  const last = columns[columns.length - 1];
  if (Array.isArray(last)) {
    // A constant subject: the same value everywhere.
    return {
      re: new Float64Array(n).fill((last as ComplexPair)[0]),
      im: new Float64Array(n).fill((last as ComplexPair)[1]),
      errors,
      steps: columns,
    };
  }
  return { ...(last === undefined ? result : (last as ValueColumn)), steps: columns };
}
