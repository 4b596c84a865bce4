import fc from 'fast-check';
import type { PropertyOutcome } from '../../shared/property-outcome';
import type { PropertyCheck } from '../../shared/schemas/property-check-schema';
import type { ComplexPair } from '../adapters/complex-pair';
import type { Target } from '../adapters/target';
import { formatDouble } from '../reference/numbers/format-double';
import { subjectProgram } from '../runner/evaluation/subject-program';
import type { PropertySubject } from './property-subject';
import type { LawContext } from './law-context';
import { PROPERTY_LAW_CHECKS } from './property-laws';
import { propertyTitle } from './property-title';
import { regionArbitrary } from './region-arbitrary';

const wire = ([re, im]: ComplexPair) => ({ re: formatDouble(re), im: formatDouble(im) });

/**
 * Runs one property check against a target with fast-check: points drawn from the check's
 * region with the pinned seed, the law checked on the library's own values at each, and on
 * failure fast-check's shrinking towards a minimal counterexample, which is checked once more
 * to record the values that show the failure. A law that does not apply to the subject, a
 * region that cannot be sampled, or an operation the target lacks gives `not-checked` with
 * the reason; nothing is silently passed.
 */
export async function checkProperty(
  check: PropertyCheck,
  subject: PropertySubject,
  target: Target,
): Promise<PropertyOutcome> {
  const law = PROPERTY_LAW_CHECKS[check.law];
  const title = propertyTitle(check, subject.text, subject.convention, subject.tolerance);
  const base = { law: check.law, title, seed: check.seed };
  const ctx: LawContext = {
    target,
    expr: subject.expr,
    convention: subject.convention,
    tolerance: subject.tolerance,
    cuts: subject.cuts,
    power: check.power,
  };
  const notApplicable = law.notApplicable(ctx);
  if (notApplicable) return { kind: 'not-checked', ...base, reason: notApplicable };
  for (const op of [...subjectProgram(subject.expr).ops, ...law.ops(ctx)]) {
    if (!(await target.supports(op))) return { kind: 'not-checked', ...base, reason: `${target.name} has no ${op}` };
  }
  const region = regionArbitrary(check.region, subject.cuts);
  if ('reason' in region) return { kind: 'not-checked', ...base, reason: region.reason };
  const points = law.arity === 1 ? fc.tuple(region.arbitrary) : fc.tuple(region.arbitrary, region.arbitrary);
  const property = fc.asyncProperty(points, async (zs: ComplexPair[]) => {
    fc.pre(!law.excludes(ctx, zs));
    return (await law.check(ctx, zs)) === null;
  });
  const details = await fc.check(property, { seed: check.seed, numRuns: check.runs });
  if (!details.failed) {
    const statement =
      `The law held at ${details.numRuns} points drawn with seed ${check.seed}` +
      (details.numSkips > 0 ? ` (${details.numSkips} more drawn where it makes no claim were excluded)` : '') +
      `: evidence for these points under this convention and tolerance, not a proof for the region.`;
    return { kind: 'held', ...base, runs: details.numRuns, excluded: details.numSkips, statement };
  }
  const counterexample = (details.counterexample?.[0] ?? []) as ComplexPair[];
  let reason: string;
  let values: Extract<PropertyOutcome, { kind: 'failed' }>['values'] = [];
  let sides: [string, string] | undefined;
  if (details.counterexample === null) {
    // fast-check gives up without a counterexample when nearly every drawn point is excluded.
    reason = `no verdict: ${details.numSkips} of the drawn points were excluded by the law (too many to reach ${check.runs} runs)`;
  } else {
    try {
      const finding = await law.check(ctx, counterexample);
      reason = finding?.reason ?? 'failed when drawn, held when checked again (the library is not deterministic)';
      values = (finding?.values ?? []).map((v) => ({ name: v.name, value: wire(v.value) }));
      sides = finding?.sides;
    } catch (e) {
      // A target that throws instead of answering an error result; fast-check shrank on the throw.
      reason = `the check threw: ${e instanceof Error ? e.message : String(e)}`;
    }
  }
  return {
    kind: 'failed',
    ...base,
    runs: details.numRuns,
    path: details.counterexamplePath ?? '',
    shrinks: details.numShrinks,
    counterexample: counterexample.map(wire),
    reason,
    values,
    ...(sides ? { sides } : {}),
  };
}
