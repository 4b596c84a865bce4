import { catalogueEntry } from '../../catalogue/catalogue-entry';
import type { SheetFamily } from '../../checks/sheet-family';
import type { SubjectExpr } from '../../expressions/subject-expr';
import { parseDouble } from '../../reference/numbers/parse-double';

/** Sheets worth trying for a root of degree q: each distinct e^{2πik/q}, k in (−q/2, q/2], at most six away. */
export function rootSheets(q: number): number[] {
  const ks: number[] = [];
  for (let k = -Math.floor((q - 1) / 2); k <= Math.floor(q / 2); k++) if (k !== 0 && Math.abs(k) <= 6) ks.push(k);
  return ks;
}

const ADDITIVE = [-2, -1, 1, 2];
const COMPLEX = [-3, -2, -1, 1, 2, 3];

/**
 * The sheet family of a subject's outermost multivalued function, seen through negations:
 * `sqrt(…)`, `cbrt(…)`, `nthroot(…, n)`, `pow(…, p/q)` and `pow(…, w)` with a constant w are
 * powers; log and the inverse functions have their additive families. Anything else (a product,
 * exp, a sum) has no family: its other values are not one rule away from the principal one.
 */
export function subjectSheetFamily(expr: SubjectExpr, sign: 1 | -1 = 1): SheetFamily | null {
  switch (expr.kind) {
    case 'neg':
      return subjectSheetFamily(expr.a, sign === 1 ? -1 : 1);
    case 'call': {
      const sheets = catalogueEntry(expr.fn)?.sheets;
      if (sheets?.kind === 'root')
        return { kind: 'power', nu: [1 / sheets.degree, 0], ks: rootSheets(sheets.degree), sign };
      return sheets?.kind === 'additive' ? { kind: sheets.family, ks: ADDITIVE, sign } : null;
    }
    case 'nthroot':
      return { kind: 'power', nu: [1 / expr.n, 0], ks: rootSheets(Math.abs(expr.n)), sign };
    case 'power': {
      if (expr.exponent.isInteger()) return null;
      const q = Number(expr.exponent.den);
      return { kind: 'power', nu: [Number(expr.exponent.num) / q, 0], ks: q <= 64 ? rootSheets(q) : COMPLEX, sign };
    }
    case 'complexPower': {
      const w = expr.exponent;
      if (w.kind !== 'const') return null;
      return { kind: 'power', nu: [parseDouble(w.re.toString()), parseDouble(w.im.toString())], ks: COMPLEX, sign };
    }
    default:
      return null;
  }
}
