import type { ComplexString } from './schemas/complex-string';
import type { PropertyCheck } from './schemas/property-check-schema';

/** A library value named as in the law's formula ("f(z)", "log(z1*z2)"), on the wire. */
type NamedValue = { name: string; value: ComplexString };

/**
 * The outcome of one property check of a suite against a target (docs/architecture.md). Every kind
 * names the law, the title (which states the law) and the pinned seed, so a failure can be
 * replayed with fast-check's `seed` and `path`. `held` is evidence for `runs` generated points,
 * not a proof; `excluded` counts points where the law makes no claim.
 */
export type PropertyOutcome =
  | {
      kind: 'held';
      law: PropertyCheck['law'];
      title: string;
      seed: number;
      runs: number;
      excluded: number;
      /** What a pass shows: the law at these drawn points, not everywhere. */
      statement: string;
    }
  | {
      kind: 'failed';
      law: PropertyCheck['law'];
      title: string;
      seed: number;
      /** Runs made until the first failure. */
      runs: number;
      /** fast-check's replay path of the shrunk counterexample. */
      path: string;
      shrinks: number;
      /** The shrunk counterexample: the point(s) drawn, z (and z2 for two-point laws). */
      counterexample: ComplexString[];
      reason: string;
      values: NamedValue[];
      /** For a law that equates two values, the names of its left and right sides among `values`. */
      sides?: [string, string];
    }
  | { kind: 'not-checked'; law: PropertyCheck['law']; title: string; seed: number; reason: string };
