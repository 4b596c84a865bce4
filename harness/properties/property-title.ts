import type { PropertyCheck } from '../../shared/schemas/property-check-schema';
import type { Convention } from '../../shared/schemas/convention-schema';
import { PROPERTY_LAW_CHECKS } from './property-laws';
import { formatComplexText } from '../../shared/format-complex-text';

function regionText(region: PropertyCheck['region']): string {
  if (region.kind === 'disc')
    return `the disc |z - (${formatComplexText(region.center, { ascii: true })})| <= ${region.radius}`;
  if (region.kind === 'box')
    return `the box ${formatComplexText(region.min, { ascii: true })} .. ${formatComplexText(region.max, { ascii: true })}`;
  return `points within ${region.distance} of the expected cuts`;
}

/**
 * The title of a property check: the law as a formula with its source, the subject, the
 * region, the convention and the pinned seed — everything needed to read a failure and replay it.
 * "conjugate-symmetry: f(conj z) = conj f(z) [ISO/IEC 9899:2011 G.6, each function's subclause …] for f(z) = sqrt(z)
 * over points within 1e-6 of the expected cuts, signed-zero, 300 runs, seed 1330520191".
 */
export function propertyTitle(check: PropertyCheck, subject: string, convention: Convention): string {
  const law = PROPERTY_LAW_CHECKS[check.law];
  const formula = check.law === 'root-power' ? law.formula.replace('^n', `^${check.power}`) : law.formula;
  return `${check.law}: ${formula} [${law.source}] for f(z) = ${subject} over ${regionText(check.region)}, ${convention}, ${check.runs} runs, seed ${check.seed}`;
}
