import type { Diagnosis } from './diagnosis';

/**
 * Where an inaccurate value is off, in words: short ("in re, opposite sign") for tables and
 * terminal lines, long ("in the real part, which has the opposite sign") for mail. Empty for
 * diagnoses stored before the part was recorded.
 */
export function describeWorstPart(d: Extract<Diagnosis, { kind: 'inaccurate' }>, style: 'short' | 'long'): string {
  if (!d.part) return '';
  if (style === 'short') return `in ${d.part}${d.signDiffers ? ', opposite sign' : ''}`;
  return `in the ${d.part === 're' ? 'real' : 'imaginary'} part${d.signDiffers ? ', which has the opposite sign' : ''}`;
}
