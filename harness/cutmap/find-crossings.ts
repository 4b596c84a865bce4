import type { ComplexPair } from '../adapters/complex-pair';
import type { Target } from '../adapters/target';
import type { GridCrossing } from './grid-crossing';

/** A neighbour step is a candidate jump when it is this many times the median step… */
const MEDIAN_FACTOR = 8;
/** …and at least this fraction of the values' size (detect-jumps.ts uses the same two rules along paths). */
const SIZE_FRACTION = 1e-3;
/**
 * Bisection levels per candidate: 30 halvings shrink a 0.1 cell to 1e-10, where a continuous
 * but steep stretch (√z next to 0 changes like √h) has lost all but 2^−15 of its step, while a
 * jump keeps its size.
 */
const LEVELS = 30;
/** A candidate is a discontinuity when at least this share of its step survives the bisection. */
const SURVIVES = 0.5;

const finite = (v: ComplexPair | null): v is ComplexPair =>
  v !== null && Number.isFinite(v[0]) && Number.isFinite(v[1]);
const step = (a: ComplexPair, b: ComplexPair) => Math.hypot(b[0] - a[0], b[1] - a[1]);

/**
 * Where `op` is discontinuous between grid neighbours. values[row][column] are the target's
 * values at the grid points zs[row][column] (null where it gave none). A neighbour pair is a
 * candidate when its step is more than 8 times the median step of all pairs and more than 1e-3
 * of the values' size; each candidate is bisected 30 times (all candidates of a level in one
 * batch), keeping the half with the larger step, and is a discontinuity when its step stays
 * at least half its first size. A midpoint where the target gives no finite value (a pole or
 * a logarithm's branch point) leaves that candidate unresolved: it is not reported.
 */
export async function findCrossings(
  target: Target,
  op: string,
  extra: readonly ComplexPair[],
  zs: readonly (readonly ComplexPair[])[],
  values: readonly (readonly (ComplexPair | null)[])[],
): Promise<GridCrossing[]> {
  type Candidate = {
    edge: GridCrossing['edge'];
    a: ComplexPair;
    b: ComplexPair;
    fa: ComplexPair;
    fb: ComplexPair;
    first: number;
    alive: boolean;
  };
  const pairs: Candidate[] = [];
  for (let row = 0; row < zs.length; row += 1) {
    for (let column = 0; column < zs[row]!.length; column += 1) {
      const here = values[row]![column]!;
      for (const [kind, r, c] of [
        ['h', row, column + 1],
        ['v', row + 1, column],
      ] as const) {
        const there = values[r]?.[c];
        if (there === undefined || !finite(here) || !finite(there)) continue;
        pairs.push({
          edge: { kind, row, column },
          a: zs[row]![column]!,
          b: zs[r]![c]!,
          fa: here,
          fb: there,
          first: step(here, there),
          alive: true,
        });
      }
    }
  }
  const sorted = pairs.map((p) => p.first).sort((x, y) => x - y);
  const median = sorted.length > 0 ? sorted[Math.floor(sorted.length / 2)]! : 0;
  const candidates = pairs.filter(
    (p) =>
      p.first > MEDIAN_FACTOR * median && p.first > SIZE_FRACTION * Math.max(Math.hypot(...p.fa), Math.hypot(...p.fb)),
  );
  for (let level = 0; level < LEVELS; level += 1) {
    const live = candidates.filter((c) => c.alive);
    if (live.length === 0) break;
    const mids = live.map((c): ComplexPair => [(c.a[0] + c.b[0]) / 2, (c.a[1] + c.b[1]) / 2]);
    const answers = await target.evaluate(
      op,
      mids.map((m) => [m, ...extra]),
    );
    live.forEach((c, i) => {
      const answer = answers[i]!;
      const fm = 'value' in answer ? answer.value : null;
      const m = mids[i]!;
      if (!finite(fm) || (m[0] === c.a[0] && m[1] === c.a[1]) || (m[0] === c.b[0] && m[1] === c.b[1])) {
        // No value at the midpoint, or the interval is down to adjacent doubles: stop here.
        if (!finite(fm)) c.alive = false;
        return;
      }
      if (step(c.fa, fm) >= step(fm, c.fb)) {
        c.b = m;
        c.fb = fm;
      } else {
        c.a = m;
        c.fa = fm;
      }
    });
  }
  return candidates
    .filter((c) => c.alive && step(c.fa, c.fb) >= SURVIVES * c.first)
    .map((c) => ({ at: [(c.a[0] + c.b[0]) / 2, (c.a[1] + c.b[1]) / 2] as ComplexPair, edge: c.edge }));
}
