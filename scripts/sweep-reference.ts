/**
 * `npm run sweep:reference`: the reference engine over SWEEP_COUNT (100,000) seeded requests drawn
 * across the whole binary64 range by scripts/reference-sweep/sweep-inputs.ts (the jest slice in
 * tests/scripts/reference-sweep/ draws a few thousand from the same generator), then a
 * SWEEP_MPMATH (2,000) sample compared bit for bit with mpmath. Prints the count, error answers,
 * NaNs, undecided roundings, the slowest values, the mpmath agreement and the wall time; exits 1
 * when any rule is broken. SWEEP_SEED changes the seed (the default is pinned and printed).
 */
import { compareWithMpmath } from './reference-sweep/compare-with-mpmath';
import { runSweep, VALUE_BOUND_MS } from './reference-sweep/run-sweep';
import { sweepInputs } from './reference-sweep/sweep-inputs';

const seed = Number(process.env.SWEEP_SEED ?? 20261205);
const count = Number(process.env.SWEEP_COUNT ?? 100_000);
const sample = Number(process.env.SWEEP_MPMATH ?? 2_000);

const started = performance.now();
const inputs = sweepInputs(seed, count);
const figures = runSweep(inputs);
console.log(`seed ${seed}: ${figures.count} inputs in ${(figures.wallMs / 1000).toFixed(1)} s`);
console.log(`error answers ${figures.errors}, NaN parts ${figures.nans}, undecided roundings ${figures.undecided}`);
for (const p of figures.problems.slice(0, 20))
  console.log(`  ${p.rule}: ${JSON.stringify(p.input)} -> ${JSON.stringify(p.answer)}`);
console.log(`slowest values (CPU ms, warm; bound ${VALUE_BOUND_MS} ms):`);
for (const s of figures.slowest) {
  console.log(`  ${s.warmMs.toFixed(1)} ms (first ${s.firstMs.toFixed(1)} ms) ${JSON.stringify(s.input)}`);
}
const first = figures.slowestFirst;
if (first) console.log(`slowest first answer: ${first.firstMs.toFixed(1)} ms of CPU ${JSON.stringify(first.input)}`);
const t = performance.now();
const agreement = compareWithMpmath(inputs, figures.answers, sample);
console.log(
  `mpmath: ${agreement.agreed} of ${agreement.compared} agree bit for bit (${((performance.now() - t) / 1000).toFixed(1)} s)`,
);
for (const d of agreement.disagreements) console.log(`  ${JSON.stringify(d.input)} ours ${d.ours} mpmath ${d.mpmath}`);
console.log(`wall time ${((performance.now() - started) / 1000).toFixed(1)} s`);
const slow = figures.slowest.some((s) => s.warmMs > VALUE_BOUND_MS);
if (figures.problems.length > 0 || agreement.agreed !== agreement.compared || slow) process.exitCode = 1;
