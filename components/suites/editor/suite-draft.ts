import type { Convention } from '../../../shared/schemas/convention-schema';
import type { SuitePath } from '../../../shared/schemas/suite-path-schema';
import type { PROPERTY_LAWS } from '../../../shared/schemas/property-check-schema';

/** A complex number as typed: two strings, kept exactly as written. */
export interface ComplexDraft {
  re: string;
  im: string;
}

export interface CutDraft {
  points: ComplexDraft[];
  toInfinity: boolean;
}

/**
 * One path as typed. Fields of every kind are kept, so switching the kind back and forth
 * loses nothing; lists (along, at, offsets) are comma-separated text.
 */
export interface PathDraft {
  kind: SuitePath['kind'];
  name: string;
  center: ComplexDraft;
  radius: string;
  startAngle: string;
  turns: string;
  direction: 'ccw' | 'cw';
  from: ComplexDraft;
  to: ComplexDraft;
  points: ComplexDraft[];
  sampling: 'samples' | 'at';
  samples: string;
  at: string;
  cutKind: 'segment' | 'ray';
  cutFrom: ComplexDraft;
  cutTo: ComplexDraft;
  along: string;
  /** Empty means the default offsets. */
  offsets: string;
  /** A grid from a file is kept as it came; the form does not edit grids. */
  grid: Record<string, unknown> | null;
}

/** A counterpart as typed: blank subject or entry means the suite's own subject or the target's default entry. */
export interface CounterpartDraft {
  subject: string;
  entry: string;
}

/** A tolerance as typed: `value` is the ulps or the relative bound; `either` holds both, ulps in `value` and the relative bound in `relative`. */
export interface ToleranceDraft {
  kind: 'ulps' | 'relative' | 'either';
  value: string;
  relative?: string;
}

export interface PropertyDraft {
  law: (typeof PROPERTY_LAWS)[number];
  region: 'disc' | 'box' | 'near-cuts';
  center: ComplexDraft;
  radius: string;
  min: ComplexDraft;
  max: ComplexDraft;
  distance: string;
  power: string;
  runs: string;
  seed: string;
}

/** Everything the suite form holds, as typed: nothing is converted until the body is built. */
export interface SuiteDraft {
  id: string;
  version: number;
  title: string;
  story: string;
  subject: string;
  branchKind: 'principal' | 'regular';
  g: string;
  nuRe: string;
  nuIm: string;
  z0: ComplexDraft;
  fixBy: 'f0' | 'k';
  f0: ComplexDraft;
  k: string;
  cuts: CutDraft[];
  convention: Convention;
  paths: PathDraft[];
  tolerances: { values: ToleranceDraft; monodromy: ToleranceDraft | null; properties: ToleranceDraft | null };
  properties: PropertyDraft[];
  counterparts: CounterpartDraft[];
}
