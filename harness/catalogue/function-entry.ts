import type { ComplexPair } from '../adapters/complex-pair';
import type { FunctionName } from '../../shared/function-arity';
import type { FunctionRule } from '../checks/function-rule';
import type { RangeCondition } from '../properties/range-condition';
import type { DemoPrincipalFunction } from './demo-principal-function';
import type { FingerprintProbe } from './fingerprint-probe';
import type { FunctionSheets } from './function-sheets';
import type { ReferenceEvaluation } from './reference-evaluation';

/**
 * Everything the harness knows about one maths function, in one place but its arity (in the light
 * table shared/function-arity.ts, keyed by the same name); the tables the rest of the code reads
 * (reference dispatch, cuts, rules, ranges, sheet families, fingerprint, demo suites) are
 * computed from these entries (harness/catalogue/function-catalogue.ts).
 */
export interface FunctionEntry {
  name: FunctionName;
  /** How the reference engine evaluates it; its file in harness/reference/functions states the branch policy. */
  reference: ReferenceEvaluation;
  /** The published definition, Annex G clause and Kahan side behind every finding's `rule`. */
  rule: FunctionRule;
  /**
   * The closed principal range the `range` law checks, or null where there is no such rule
   * (exp; powers and roots, whose range follows from the exponent: powerRange).
   */
  range: readonly RangeCondition[] | null;
  /**
   * |z·f′(z)|: how far f moves when z moves by a relative amount (the first-order sensitivity
   * of a backward-stable evaluation, f(z(1 + δ)) ≈ f(z) + δ·z·f′(z)), from the function's
   * derivative in DLMF. A symmetry law allows each library value this much, times the
   * tolerance, on top of the value's own rounding. Infinite at a branch point; null for pow
   * and nthroot, whose sensitivity depends on the exponent (|w|·|f|).
   */
  sensitivity: ((z: ComplexPair) => number) | null;
  /** How its other values lie, for diagnosing a value on another sheet. */
  sheets: FunctionSheets;
  /** How the convention fingerprint calls it on its cuts; empty for a function without cuts. */
  fingerprint: readonly FingerprintProbe[];
  /** Its principal-branch suites in the demo catalogue, each written under both conventions. */
  demo: readonly DemoPrincipalFunction[];
}
