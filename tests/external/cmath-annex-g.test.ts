import { formatDouble } from '../../harness/reference/numbers/format-double';
import { parseDouble } from '../../harness/reference/numbers/parse-double';
import { C_RULE } from './c-rule-where-cmath-raises';
import type { CmathAnswer } from './cmath-answer';
import { CMATH_CASES } from './cmath-cases';
import { compareWithCmath } from './cmath-compare';
import { cutPointsOf } from './cut-points-of';
import { askPython, type OraclePoint } from './python-oracle';

// Python's cmath (Debian python3, /usr/bin/python3) follows ISO/IEC 9899 Annex G for special
// values and signed zeros (its documentation says so); it raises ValueError where C returns a
// value and signals divide-by-zero or invalid. All comparisons in this file are against cmath
// from one batch, except the rows cmath refuses, which are checked against the C rule itself.

const grid: OraclePoint[] = [];
for (const fn of CMATH_CASES.functions)
  for (const x of CMATH_CASES.special)
    for (const y of CMATH_CASES.special) grid.push({ fn, z: [formatDouble(x), formatDouble(y)] });

const cutPoints = cutPointsOf(CMATH_CASES.cuts);

describe('principal values against Python cmath (ISO/IEC 9899 Annex G)', () => {
  const specialAnswers = askPython<CmathAnswer>('cmath', grid);
  const cutAnswers = askPython<CmathAnswer>('cmath', cutPoints);

  it.each(CMATH_CASES.functions.map((fn) => [fn]))('matches every Annex G special value of %s sign-exactly', (fn) => {
    const failures: string[] = [];
    grid.forEach((p, i) => {
      if (p.fn !== fn) return;
      const result = compareWithCmath(
        fn,
        parseDouble(p.z[0]),
        parseDouble(p.z[1]),
        specialAnswers[i] as CmathAnswer,
        CMATH_CASES.ulps,
      );
      if (result) failures.push(result);
    });
    expect(failures).toEqual([]);
  });

  it.each(Object.keys(CMATH_CASES.cuts).map((fn) => [fn]))(
    'takes the side of each %s cut that the zero sign names, as cmath does',
    (fn) => {
      const failures: string[] = [];
      cutPoints.forEach((p, i) => {
        if (p.fn !== fn) return;
        const result = compareWithCmath(
          fn,
          parseDouble(p.z[0]),
          parseDouble(p.z[1]),
          cutAnswers[i] as CmathAnswer,
          CMATH_CASES.ulps,
        );
        if (result) failures.push(result);
      });
      expect(failures).toEqual([]);
    },
  );

  it('records which rows cmath refuses, so the C rules above are exercised', () => {
    const refused = grid.filter((_, i) => specialAnswers[i]?.raises).map((p) => `${p.fn}(${p.z.join(', ')})`);
    expect(refused.length).toBeGreaterThan(0);
    for (const row of refused) expect(Object.keys(C_RULE)).toContain(row.slice(0, row.indexOf('(')));
  });
});
