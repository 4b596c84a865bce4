import type { ComplexDouble } from '../../../harness/checks/complex-double';
import { detectJumps } from '../../../harness/checks/detect-jumps';
import { findMisplacedCuts } from '../../../harness/checks/find-misplaced-cuts';
import { buildPath } from '../../../harness/paths/build-path';
import type { Diagnosis } from '../../../shared/diagnosis';
import { referenceDouble } from './reference-double';

const circle = buildPath({
  kind: 'circle',
  center: { re: 0, im: 0 },
  radius: 1,
  startAngle: 'pi/8',
  turns: 1,
  direction: 'ccw',
  samples: 65,
});
const t = circle.map((p) => p.t);
const z = circle.map((p): ComplexDouble => [p.z.re, p.z.im]);
const expected = z.map((p) => referenceDouble('sqrt', p));
/** A square root with its cut on the positive real axis: arg z taken in [0, 2π), i.e. −(principal) below the real axis. */
const cutOnPositiveAxis = z.map((p, i): ComplexDouble =>
  p[1] < 0 || Object.is(p[1], -0) ? [-expected[i]![0], -expected[i]![1]] : expected[i]!,
);

describe('detectJumps', () => {
  it('finds the one jump of the principal square root on the unit circle, where it crosses (−∞, 0]', () => {
    // DLMF 4.2 (principal powers): √z is continuous except across the negative real axis.
    const jumps = detectJumps(expected);
    expect(jumps.filter(Boolean)).toHaveLength(1);
    const step = jumps.indexOf(true);
    expect(z[step]![1]).toBeGreaterThanOrEqual(0);
    expect(z[step + 1]![1]).toBeLessThan(0);
    expect(z[step]![0]).toBeLessThan(0);
  });

  it('finds no jump in exp along the same circle', () => {
    expect(detectJumps(z.map((p) => referenceDouble('exp', p))).some(Boolean)).toBe(false);
  });
});

describe('findMisplacedCuts', () => {
  it('re-diagnoses the points between a cut on the positive axis and the expected cut as a misplaced cut', () => {
    const pointDiagnoses = cutOnPositiveAxis.map((v, i): Diagnosis[] | null =>
      v[0] === expected[i]![0] && v[1] === expected[i]![1] ? null : [{ kind: 'other-sheet', k: 1 }],
    );
    const failing = pointDiagnoses.filter(Boolean).length;
    expect(failing).toBeGreaterThan(10);
    const result = findMisplacedCuts(t, expected, cutOnPositiveAxis, pointDiagnoses);
    const misplaced = result
      .map((labels) => labels?.[0])
      .filter((d): d is Extract<Diagnosis, { kind: 'misplaced-cut' }> => d?.kind === 'misplaced-cut');
    expect(misplaced).toHaveLength(failing);
    const jumpAt = misplaced[0]!.expectedJumpAt!;
    // The expected jump is where the circle (starting at π/8) crosses angle π: t = (1 − 1/8)/2.
    expect(Math.abs(jumpAt - 7 / 16)).toBeLessThan(1 / 64);
  });

  it('keeps a point-level diagnosis when the library jumps where the reference does', () => {
    // The whole circle on the other sheet: −√z everywhere jumps at the same place, so k = 1 stands.
    const negated = expected.map((v): ComplexDouble => [-v[0], -v[1]]);
    const diagnoses = negated.map((): Diagnosis[] => [{ kind: 'other-sheet', k: 1 }]);
    expect(findMisplacedCuts(t, expected, negated, diagnoses).every((d) => d?.[0]?.kind === 'other-sheet')).toBe(true);
  });

  it('keeps a cut-side diagnosis next to a mismatched jump', () => {
    const diagnoses = cutOnPositiveAxis.map((): Diagnosis[] | null => null);
    const onCut = 10;
    diagnoses[onCut] = [{ kind: 'cut-side' }];
    const actual = expected.map((v, i): ComplexDouble => (i === onCut ? [-v[0], -v[1]] : v));
    expect(findMisplacedCuts(t, expected, actual, diagnoses)[onCut]).toEqual([{ kind: 'cut-side' }]);
  });

  it('leads with misplaced-cut and keeps the other labels, dropping unexplained and inaccurate', () => {
    const inaccurate: Diagnosis = { kind: 'inaccurate', ulps: 1e9, relativeError: 1e-3 };
    const zeroSign: Diagnosis = { kind: 'zero-sign', part: 'im', of: 'output' };
    const pointDiagnoses = cutOnPositiveAxis.map((v, i): Diagnosis[] | null =>
      v[0] === expected[i]![0] && v[1] === expected[i]![1]
        ? null
        : i % 2 === 0
          ? [{ kind: 'other-sheet', k: 1 }, zeroSign]
          : [{ kind: 'unexplained', relativeError: 2 }, inaccurate],
    );
    const result = findMisplacedCuts(t, expected, cutOnPositiveAxis, pointDiagnoses);
    result.forEach((labels, i) => {
      if (!pointDiagnoses[i]) return expect(labels).toBeNull();
      expect(labels![0]!.kind).toBe('misplaced-cut');
      expect(labels!.slice(1)).toEqual(i % 2 === 0 ? [{ kind: 'other-sheet', k: 1 }, zeroSign] : []);
    });
  });
});
