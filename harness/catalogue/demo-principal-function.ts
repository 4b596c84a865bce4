import type { PropertyCheck } from '../../shared/schemas/property-check-schema';

type Point = [string, string];

/** A cut of a principal branch as DLMF §4.23/§4.37 place it: a ray or a segment. */
export type DemoCut = { kind: 'ray'; from: Point; through: Point } | { kind: 'segment'; from: Point; to: Point };

/** One principal-branch suite of the demo catalogue (scripts/demo-catalogue): the subject, its cuts and branch points, the laws and the story. */
export interface DemoPrincipalFunction {
  /** The subject, e.g. `asin(z)` or `nthroot(z, 5)`. */
  subject: string;
  /** Used in suite ids. */
  slug: string;
  title: string;
  cuts: DemoCut[];
  /** Finite branch points, each circled by a path. */
  branchPoints: Point[];
  /** Circle radius around each branch point (half the distance to the nearest other one). */
  radius: string;
  laws: Omit<PropertyCheck, 'seed' | 'runs'>[];
  story: string;
}
