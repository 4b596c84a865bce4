import { relativeError } from '../../harness';
import type { DiagnosisKind } from '../../shared/diagnosis';
import type { DiagnosisClass } from '../../shared/diagnosis-class';
import { outcomeClass } from '../../shared/outcome-class';
import { outcomeLabels } from '../../shared/outcome-labels';
import { wireDouble } from '../../shared/wire-double';
import type { PointFinding, RunResult } from '../../shared/run-result';

/** 4 eps = 4 · 2^−52: the bound for "noise" a maintainer would not act on. */
const NOISE_BOUND = 4 * Number.EPSILON;

/** The figures of one run's JSON: what scripts/findings-figures.ts prints. */
export interface FindingsFigures {
  failures: number;
  /** Failing points listed (findings); when below `failures`, the figures below cover only those. */
  listed: number;
  byClass: Record<DiagnosisClass, number>;
  /** Every label counted (a point with two labels counts under both). */
  byLabel: Partial<Record<DiagnosisKind, number>>;
  /** The leading label only. */
  byLeading: Partial<Record<DiagnosisKind, number>>;
  /**
   * Failures within NOISE_BOUND normwise of the expected value with every zero part's sign right
   * (under the suite's convention: zero signs count under signed-zero only), recomputed from the
   * values, not from the labels.
   */
  noise: number;
  /** Of `noise`, those whose non-zero parts also all have the expected sign. */
  noiseSameSigns: number;
  /** Up to five of the `noise` failures, as suite, path, z, expected, actual. */
  noiseExamples: string[];
}

const value = (w: { re: string; im: string }): [number, number] => [wireDouble(w.re), wireDouble(w.im)];

/**
 * Counts a run's failures by class and label, and how many are noise: right sheet (within 4 eps
 * normwise of the expected value, which no other sheet or side is) with the right zero signs.
 * Works on results written before labels and classes existed (a failure's diagnosis is then its
 * one label).
 */
export function countFindings(result: RunResult): FindingsFigures {
  const figures: FindingsFigures = {
    failures: result.counts.fail,
    listed: 0,
    byClass: { branch: 0, accuracy: 0 },
    byLabel: {},
    byLeading: {},
    noise: 0,
    noiseSameSigns: 0,
    noiseExamples: [],
  };
  for (const r of result.results) {
    const zeroSigns = r.checked.convention === 'signed-zero';
    for (const p of r.paths)
      for (const f of p.findings as PointFinding[]) {
        const cls = outcomeClass(f.outcome);
        if (!cls || !f.actual || !f.expected) continue;
        figures.listed += 1;
        figures.byClass[cls] += 1;
        const labels = outcomeLabels(f.outcome);
        for (const l of labels) figures.byLabel[l.kind] = (figures.byLabel[l.kind] ?? 0) + 1;
        const lead = labels[0]!.kind;
        figures.byLeading[lead] = (figures.byLeading[lead] ?? 0) + 1;
        const a = value(f.actual);
        const e = value(f.expected);
        const zeroSignsRight = !zeroSigns || [0, 1].every((i) => a[i] !== 0 || e[i] !== 0 || Object.is(a[i], e[i]));
        if (!(relativeError(a, e) <= NOISE_BOUND && zeroSignsRight)) continue;
        figures.noise += 1;
        if ([0, 1].every((i) => a[i] === 0 || e[i] === 0 || Math.sign(a[i]!) === Math.sign(e[i]!)))
          figures.noiseSameSigns += 1;
        if (figures.noiseExamples.length < 5)
          figures.noiseExamples.push(
            `${r.suite.id} "${p.name}" z = ${f.z.re} ${f.z.im}i: expected ${f.expected.re} ${f.expected.im}i, actual ${f.actual.re} ${f.actual.im}i (${labels.map((l) => l.kind).join(' + ')})`,
          );
      }
  }
  return figures;
}
