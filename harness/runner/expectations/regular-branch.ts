import type { Suite } from '../../../shared/schemas/suite-schema';
import type { SubjectExpr } from '../../expressions/subject-expr';
import type { PathPoint } from '../../paths/path-point';
import type { BigComplex } from '../../reference/complex/big-complex';
import type { Point } from '../../reference/continuation/continuation-path';
import type { ContinuationRequest } from '../../reference/continuation/continuation-request';
import type { ExactNu } from '../../reference/continuation/cut-layout';
import type { Singularity } from '../../reference/continuation/factored-function';
import type { CutGeometry } from './cut-geometry';
import type { ReferenceCache } from '../reference-cache/reference-cache';
import type { WireComplex } from '../../../shared/wire-complex';

/**
 * Everything the steps of a regular suite's expectation share: the branch resolved from the
 * suite (exact ν, z0, f0 and cuts), where its values are cached, and what it has computed so far.
 */
export interface RegularBranch {
  suite: Suite;
  branch: Extract<Suite['branch'], { kind: 'regular' }>;
  cache: ReferenceCache;
  cacheKey: string;
  /** ν as written, for messages. */
  nuText: WireComplex;
  nu: ExactNu;
  /** ν in doubles, for telling sheets apart and for the library's monodromy. */
  nuDouble: [number, number];
  /** The principal g^ν, evaluated exactly at a point's bits. */
  gPow: SubjectExpr;
  /** Zeros and poles of g, where the branch has no finite non-zero value. */
  singular: Singularity[];
  geometry: CutGeometry;
  /** What every continuation of this branch shares: g, ν, z0, the branch at z0 and the cuts. */
  continuation: Omit<ContinuationRequest, 'path' | 'at'>;
  z0: Point;
  /** C = f0/P(z0) at working precision; null when the branch is named by k (the continuation carries the k). */
  C: BigComplex | null;
  /** C in doubles ([1, 0] without one). */
  CDouble: Point;
  /** "the regular branch of (g)^(ν) with … at z0 = …". */
  description: string;
  /** The sheets offered as alternatives of a failing value. */
  sheetKs: number[];
  /** e^{2πiνk} by k. */
  factors: Map<number, BigComplex>;
  /** Continued values by point ("re,im"). */
  continued: Map<string, Point>;
  /** Continued values along a whole path, by its points (null: not continued that way). */
  pathValues: WeakMap<readonly PathPoint[], (Point | null)[] | null>;
  /** Why a point was refused, by "kind:re,im". */
  refusals: Map<string, string>;
}
