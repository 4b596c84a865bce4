import type { DemoCut } from './demo-principal-function';

const ray = (from: [string, string], through: [string, string]): DemoCut => ({ kind: 'ray', from, through });
const segment = (from: [string, string], to: [string, string]): DemoCut => ({ kind: 'segment', from, to });
const points = (...p: [string, string][]): [string, string][] => p;

/**
 * The cuts, branch points and property regions several demo suites share: the cuts as DLMF
 * §4.2, §4.23 and §4.37 place them, the branch points ±1 and ±i, the band along the cuts and
 * the disc |z| ≤ 4 the laws are checked on.
 */
export const DEMO_SHAPES = {
  negativeRealAxis: ray(['0', '0'], ['-1', '0']),
  realRaysFromOne: [ray(['1', '0'], ['2', '0']), ray(['-1', '0'], ['-2', '0'])],
  imaginaryRaysFromI: [ray(['0', '1'], ['0', '2']), ray(['0', '-1'], ['0', '-2'])],
  realUnitSegment: segment(['-1', '0'], ['1', '0']),
  imaginaryUnitSegment: segment(['0', '-1'], ['0', '1']),
  branchPointsOne: points(['1', '0'], ['-1', '0']),
  branchPointsI: points(['0', '1'], ['0', '-1']),
  nearCuts: { kind: 'near-cuts' as const, distance: '1e-6' },
  disc: { kind: 'disc' as const, center: { re: '0', im: '0' }, radius: '4' },
};
