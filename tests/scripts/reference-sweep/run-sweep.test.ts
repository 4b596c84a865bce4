import { CATALOGUE_ENTRIES } from '../../../harness';
import { compareWithMpmath } from '../../../scripts/reference-sweep/compare-with-mpmath';
import { runSweep, VALUE_BOUND_MS } from '../../../scripts/reference-sweep/run-sweep';
import { sweepInputs } from '../../../scripts/reference-sweep/sweep-inputs';

// The seeded slice of `npm run sweep:reference` (100,000 inputs there, the same generator): a few
// thousand inputs here, about a second on the 2-core machine, so the normal run stays quick.
const SEED = 20261205;
const SLICE = 4_000;
const MPMATH_SAMPLE = 200;

describe(`the reference sweep (seed ${SEED}, ${SLICE} inputs)`, () => {
  const inputs = sweepInputs(SEED, SLICE);
  const figures = runSweep(inputs);

  it('draws every catalogue function, both conventions, every region and both zeros on the cuts', () => {
    expect(new Set(inputs.map((i) => i.fn))).toEqual(new Set(CATALOGUE_ENTRIES.map((e) => e.name)));
    expect(new Set(inputs.map((i) => i.convention))).toEqual(new Set(['signed-zero', 'counter-clockwise']));
    const regions = new Set(inputs.map((i) => i.category.split(',')[0]));
    for (const region of ['bits', 'subnormal', 'near-overflow', 'integers and halves', 'on a cut', 'on an axis']) {
      expect(regions).toContain(region);
    }
    const onCuts = inputs.filter((i) => i.category.startsWith('on a cut'));
    const zeros = new Set(onCuts.flatMap((i) => [i.z.re, i.z.im]).filter((t) => t === '0' || t === '-0'));
    expect(zeros).toEqual(new Set(['0', '-0']));
    expect(inputs.some((i) => i.z.re === '1.7976931348623157e+308' || i.z.re === '-1.7976931348623157e+308')).toBe(
      true,
    );
    expect(inputs.some((i) => i.category.includes('w huge')) && inputs.some((i) => i.category.includes('w tiny'))).toBe(
      true,
    );
  });

  it('answers every input without an error, a NaN or an undecided rounding', () => {
    expect({ seed: SEED, problems: figures.problems.slice(0, 5) }).toEqual({ seed: SEED, problems: [] });
  });

  it(`answers every input within ${VALUE_BOUND_MS} ms once warm`, () => {
    const slow = figures.slowest.filter((s) => s.warmMs > VALUE_BOUND_MS).map((s) => ({ ...s.input, ms: s.warmMs }));
    expect({ seed: SEED, slow }).toEqual({ seed: SEED, slow: [] });
  });

  it(`agrees bit for bit with mpmath on ${MPMATH_SAMPLE} inputs off the axes`, () => {
    // mpmath, 60 digits on at least 720 working digits (Debian python3-mpmath, /usr/bin/python3).
    const agreement = compareWithMpmath(inputs, figures.answers, MPMATH_SAMPLE);
    expect(agreement.compared).toBe(MPMATH_SAMPLE);
    expect({ seed: SEED, disagreements: agreement.disagreements }).toEqual({ seed: SEED, disagreements: [] });
  });

  it('reports a disagreement when one answer is a bit off', () => {
    const i = inputs.findIndex(
      (x) => x.fn === 'sqrt' && x.z.re !== '0' && x.z.re !== '-0' && x.z.im !== '0' && x.z.im !== '-0',
    );
    const answer = figures.answers[i];
    if (!answer || 'error' in answer) throw new Error(`seed ${SEED}: no sqrt answer at ${i}`);
    const re = Number(answer.double.re);
    const tampered = { ...answer, double: { ...answer.double, re: String(re + re * Number.EPSILON) } };
    const agreement = compareWithMpmath([inputs[i]!], [tampered], 1);
    expect(agreement).toMatchObject({ compared: 1, agreed: 0 });
  });
});
