import type { WireComplex } from './wire-complex';
/**
 * Which convention a target follows on each cut of each function (docs/vocabulary.md, "fingerprint";
 * docs/conventions.md). Per (function, cut):
 * - `signed-zero`: on the cut, +0 and −0 in the across part give the two one-sided limits (Annex G);
 * - `counter-clockwise`: both give the limit from the side Kahan's rule closes;
 * - `neither`: something else (the other side closed, the signs swapped, the cut elsewhere, no value);
 * - `inconsistent`: the points along this cut disagree among themselves, or functions sharing the
 *   cut (sqrt, pow(z, 1/2) and log on (−∞, 0]) follow different conventions.
 * `alone` is the function's own verdict before comparing with the functions that share its cut.
 * `statement` says what was and was not checked: this is evidence at the listed points, not a certification.
 */
/** One function's side of a fingerprint disagreement at one point. */
export interface FingerprintSide {
  function: string;
  /** The point with the zero sign at which this function's two conventions differ. */
  at: WireComplex;
  value: WireComplex | null;
  reference: { 'signed-zero': WireComplex; 'counter-clockwise': WireComplex };
  /** Which reference the value is (to the fingerprint's relative 1e-6); null: neither. */
  follows: 'signed-zero' | 'counter-clockwise' | null;
}

/** A point where two functions sharing a cut follow different conventions (ConventionFingerprint's `disagreements`). */
export interface FingerprintDisagreement {
  with: string;
  /** The place on the cut, written with +0 in the part across it (as a probe's `at`; the −0 twin is implied). */
  at: WireComplex;
  /** This function's side, then the other's. */
  sides: [FingerprintSide, FingerprintSide];
}

export interface ConventionFingerprint {
  target: string;
  /** The entry every value was built through (shared/target-entry.ts); absent on fingerprints made before entries. */
  entry?: string;
  statement: string;
  /** Functions the target does not have, so not fingerprinted. */
  missing: string[];
  cuts: {
    function: string;
    cut: string;
    behaviour: 'signed-zero' | 'counter-clockwise' | 'neither' | 'inconsistent';
    alone: 'signed-zero' | 'counter-clockwise' | 'neither' | 'inconsistent';
    /** Functions on the same cut that follow the other convention. */
    disagreesWith: string[];
    /**
     * For each function in `disagreesWith`, a place where the two part ways: each function's
     * library value there (at the zero sign where its conventions differ) and its reference under
     * both conventions, so a reader sees which convention each value follows. Absent on
     * fingerprints made before it was.
     */
    disagreements?: FingerprintDisagreement[];
    probes: {
      /** The point on the cut (with +0 in the across part; the −0 twin is implied). */
      at: WireComplex;
      verdict: 'signed-zero' | 'counter-clockwise' | 'neither';
      plusZero: WireComplex | null;
      minusZero: WireComplex | null;
      note?: string;
    }[];
  }[];
}
