import type { TargetIdentity } from './target-identity';
import type { DiagnosisKind } from './diagnosis';
import type { DiagnosisClass } from './diagnosis-class';
import type { PointOutcome } from './point-outcome';
import type { PropertyOutcome } from './property-outcome';
import type { SkipReason } from './skip-reason';
import type { SuitePath } from './schemas/suite-path-schema';
import type { WireComplex } from './wire-complex';

/** How many points of a path, a suite × target pair or a run came out each way. */
export interface OutcomeCounts {
  pass: number;
  fail: number;
  error: number;
  skipped: number;
  /** Points the target's entry cannot express (a −0 through plain numbers): counted apart, never failures. */
  notApplicable: number;
}

/** Failing points by class (diagnosis-class.ts): a point with any branch label is a branch finding, else an accuracy finding. */
export type ClassCounts = Record<DiagnosisClass, number>;

/**
 * How one counterpart of a suite (another subject, or another entry) fared along one path:
 * `compared` points had a value both ways, `disagreed` of them differ (each carries the
 * `disagreement` label); `oneSided` counts the points where only one way gave a value, by reason,
 * so they are said to be so instead of disagreeing.
 */
export interface AgreementSummary {
  with: string;
  compared: number;
  disagreed: number;
  oneSided: { reason: string; count: number }[];
  /** Why the counterpart's own reference is missing, when it is (then no disagreement can say which value left it). */
  note?: string;
}

/**
 * One step of a composed subject at one point, as the library computed it and as the reference
 * does from the same input: `text` is the step as written ("pow(z, 13)"); `left` says the
 * library's value is no longer the reference's (beyond the tolerance, or a zero of the other sign).
 */
export interface StepValue {
  text: string;
  library: WireComplex | null;
  reference: WireComplex | null;
  left: boolean;
}

/**
 * One point that did not pass, with everything a reviewer needs to see it again: the exact
 * input (decimal and C hex float), both values, the diagnosis, both one-sided limits when the
 * point lies on a cut, the rule that fixes the expected value, and a reproducer to paste into
 * the target's language.
 */
export interface PointFinding {
  path: string;
  /** Index of the point in its path. */
  index: number;
  t: number;
  /** The path's own name for the point ("above 1e-9", "on -0"), when it has one. */
  label?: string;
  z: WireComplex;
  /** The input's exact bits as C99 hex floats ("-0x1.8p+1", "-0x0p+0"). */
  zHex: WireComplex;
  expected: WireComplex | null;
  actual: WireComplex | null;
  outcome: PointOutcome;
  /** For a point on a cut: the limits from both sides, named ("from above", "from below"). */
  limits?: { sides: [string, string]; values: [WireComplex, WireComplex] };
  /** The standard clause or rule that fixes the expected value here. */
  rule: string;
  /** Copy-paste code in the target's language that computes `actual`. */
  reproducer: string;
  /** A composed subject's intermediate values, in evaluation order (absent for a single call). */
  steps?: StepValue[];
  /** The index in `steps` of the step that first left the reference (absent: none did, or no steps). */
  firstLeftStep?: number;
  /**
   * Where conventions disagree about the value (acsc, asec, acsch, acoth at 0), the rule that makes
   * the expected value: a choice, not a fact every library must share.
   */
  choice?: string;
}

/**
 * The library's monodromy along a closed path: its values followed across each of their own
 * jumps (each jump taken as the nearest factor e^{2πiνk}) come back multiplied by `library`;
 * the continued branch says `expected`.
 */
export interface MonodromyCheck {
  expected: WireComplex;
  library: WireComplex | null;
  relativeError: number | null;
  pass: boolean;
  /** Why the library's factor could not be read (a missing value, a jump that is no e^{2πiνk}). */
  note?: string;
}

export interface PathResult {
  name: string;
  kind: SuitePath['kind'];
  points: number;
  counts: OutcomeCounts;
  /** Labels counted: a point with two labels counts under both. */
  byDiagnosis: Partial<Record<DiagnosisKind, number>>;
  byClass: ClassCounts;
  /** The suite's counterparts along this path (absent when it has none). */
  agreements?: AgreementSummary[];
  /** Jumps along a continuous path (circle, segment, polyline): mid-step values of t. */
  jumps: { expected: number[]; library: number[] } | null;
  /** For a closed path of a regular branch; null where it does not apply. */
  monodromy: MonodromyCheck | null;
  findings: PointFinding[];
  /** Failing points beyond the detail limit: counted above, not listed. */
  findingsOmitted: number;
  /** Why points were skipped (no such operation, no reference value there), with how many each. */
  skipped: SkipReason[];
  /** The entry this path's inputs went in through (shared/target-entry.ts), when it names its own. */
  entry?: string;
  /** Why points were not applicable to the entry (counts.notApplicable), with how many each. */
  notApplicable?: { reason: string; count: number }[];
  /** An error that stopped the whole path (its points count as errors). */
  error?: string;
}

/** What a suite × target result covered, stated in every output format. */
export interface CheckedScope {
  convention: string;
  branch: string;
  tolerance: string;
  paths: number;
  points: number;
  /** The target's entry the suite's inputs went in through (shared/target-entry.ts); absent in results stored before entries. */
  entry?: string;
  /** Property laws the suite lists, and whether this run checked them. */
  properties: { listed: string[]; run: boolean; note: string };
}

export type PairStatus = 'pass' | 'fail' | 'error' | 'cancelled';

/** One suite against one target. */
export interface SuiteTargetResult {
  suite: { id: string; version: number; title: string; subject: string };
  target: TargetIdentity;
  status: PairStatus;
  checked: CheckedScope;
  counts: OutcomeCounts;
  byDiagnosis: Partial<Record<DiagnosisKind, number>>;
  byClass: ClassCounts;
  paths: PathResult[];
  properties: PropertyOutcome[] | null;
  /** Errors of the pair as a whole (no single point): a target that hung past the time limit, crashed, or a suite that could not be evaluated. */
  errors: string[];
  durationMs: number;
  /** Reference values computed in this run and taken from the cache. */
  reference: { computed: number; cached: number };
}

/** The JSON result of `sheetkeeper run` (docs/suite-format.md). */
export interface RunResult {
  tool: { name: 'sheetkeeper'; version: string };
  startedAt: string;
  finishedAt: string;
  seed: number | null;
  status: 'pass' | 'fail' | 'error' | 'cancelled';
  /** Always present: what a pass means and does not mean. */
  disclaimer: string;
  plan: { suites: { id: string; version: number }[]; targets: string[]; slices: number };
  counts: OutcomeCounts;
  byDiagnosis: Partial<Record<DiagnosisKind, number>>;
  byClass: ClassCounts;
  results: SuiteTargetResult[];
  reference: { computed: number; cached: number };
}
