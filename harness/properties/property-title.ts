import type { PropertyCheck } from '../../shared/schemas/property-check-schema';
import type { Convention } from '../../shared/schemas/convention-schema';
import { PROPERTY_LAW_CHECKS } from './property-laws';
import { formatComplexText } from '../../shared/format-complex-text';
import type { Tolerance } from '../../shared/schemas/tolerance-schema';
import { lawTolerance } from './law-tolerance';

function regionText(region: PropertyCheck['region']): string {
  if (region.kind === 'disc')
    return `the disc |z - (${formatComplexText(region.center, { ascii: true })})| <= ${region.radius}`;
  if (region.kind === 'box')
    return `the box ${formatComplexText(region.min, { ascii: true })} .. ${formatComplexText(region.max, { ascii: true })}`;
  return `points within ${region.distance} of the expected cuts`;
}

/**
 * The title of a property check: the law as a formula with its source, the subject, the
 * region, the convention, what the law allows with the tolerance t it was given, and the pinned
 * seed — everything needed to read a failure and replay it.
 * "conjugate-symmetry: f(conj z) = conj f(z) [ISO/IEC 9899:2011 G.6, each function's subclause …] for f(z) = sqrt(z)
 * over points within 1e-6 of the expected cuts, signed-zero, t = 16 ulps (3.55e-15) per library value, allowing
 * |left - right| <= 2t(…); 300 runs, seed 1330520191".
 */
export function propertyTitle(
  check: PropertyCheck,
  subject: string,
  convention: Convention,
  tolerance: Tolerance,
): string {
  const law = PROPERTY_LAW_CHECKS[check.law];
  const formula = check.law === 'root-power' ? law.formula.replace('^n', `^${check.power}`) : law.formula;
  const t =
    'ulps' in tolerance
      ? `${tolerance.ulps} ulps (${lawTolerance(tolerance).toPrecision(3)})`
      : `${tolerance.relative}`;
  return `${check.law}: ${formula} [${law.source}] for f(z) = ${subject} over ${regionText(check.region)}, ${convention}, t = ${t} per library value, allowing ${law.allowance}; ${check.runs} runs, seed ${check.seed}`;
}
