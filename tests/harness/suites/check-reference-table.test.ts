import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { checkReferenceTable } from '../../../harness/suites/check-reference-table';
import type { Suite } from '../../../shared/schemas/suite-schema';
import { validateSuite } from '../../../shared/validate-suite';

const load = (id: string): Suite => {
  const checked = validateSuite(
    JSON.parse(readFileSync(path.join(__dirname, '..', '..', '..', 'suites', 'demo', `${id}.json`), 'utf8')),
    id,
  );
  if (!checked.ok) throw new Error(`${id} invalid`);
  return checked.suite;
};

/** Off-cut points (mpmath has no signed zeros, so points on a cut are left out). */
const POINTS = [
  [0.5, 0.25],
  [-3, 1e-9],
  [2, -0.75],
  [1e-5, 7],
  [-0.125, -4],
];

// mpmath, 50 digits: asin at each point, rounded to doubles by Python's float().
const mpmathCsv = execFileSync(
  '/usr/bin/python3',
  [
    '-c',
    `import mpmath, json, sys
mpmath.mp.dps = 50
print("z_re,z_im,expected_re,expected_im,source")
for re, im in json.loads(sys.argv[1]):
    w = mpmath.asin(mpmath.mpc(re, im))
    print(f"{float.hex(float(re))},{float.hex(float(im))},{mpmath.nstr(w.real, 40)},{mpmath.nstr(w.imag, 40)},mpmath 50 digits")`,
    JSON.stringify(POINTS),
  ],
  { encoding: 'utf8' },
);

describe('checkReferenceTable', () => {
  it('agrees with asin values computed by mpmath at 50 digits', () => {
    const result = checkReferenceTable(load('asin-principal-sz'), mpmathCsv);
    expect(result).toMatchObject({ rows: 5, agree: 5, disagreements: [], invalid: [] });
  });

  it('lists a row whose value is on the other side of the cut, with its line', () => {
    const lines = mpmathCsv.trim().split('\n');
    // Line 3 (the point just above (−∞, −1]): conjugate the expected value, i.e. the limit from below.
    const cells = lines[2]!.split(',');
    cells[3] = cells[3]!.startsWith('-') ? cells[3]!.slice(1) : `-${cells[3]}`;
    lines[2] = cells.join(',');
    const result = checkReferenceTable(load('asin-principal-sz'), lines.join('\n'));
    expect(result.agree).toBe(4);
    expect(result.disagreements).toEqual([expect.objectContaining({ line: 3, source: 'mpmath 50 digits' })]);
    expect(result.disagreements[0]!.ulps).toBeGreaterThan(1e15);
  });

  it('reports unreadable rows and missing columns', () => {
    expect(
      checkReferenceTable(load('asin-principal-sz'), 'z_re,z_im,expected_re,expected_im\n1,two,0,0\n').invalid,
    ).toEqual([expect.objectContaining({ line: 2 })]);
    expect(checkReferenceTable(load('asin-principal-sz'), 'a,b\n1,2\n').invalid).toEqual([
      { line: 1, reason: 'missing columns: z_re, z_im, expected_re, expected_im' },
    ]);
  });

  it('checks a regular branch by continuing it to each point', () => {
    // √(z−1)·√(z+1) at 3i is i·√10 on the branch that is ≈ z at infinity (common practice: |z²−1| = 10).
    const csv = `z_re,z_im,expected_re,expected_im,source\n0,3,0,${Math.sqrt(10)},by hand\n0,3,0,${-Math.sqrt(10)},the other sheet\n`;
    const result = checkReferenceTable(load('sqrt-z2-minus-1-finite-cut'), csv);
    expect(result.agree).toBe(1);
    expect(result.disagreements.map((d) => d.source)).toEqual(['the other sheet']);
  });
});
