import { numberString } from '../../shared/schemas/complex-string';

/** First characters that make Excel, LibreOffice Calc or Google Sheets read a cell as a formula (OWASP "CSV Injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A CSV cell as a spreadsheet will not run it. Text that starts like a formula gets a leading
 * single quote, the usual neutralisation (a path named `=HYPERLINK("http://…","x")` becomes the
 * text `'=HYPERLINK(…)`). A `number` column keeps its numbers as written: JavaScript numbers,
 * and wire numbers in the suite format (decimals, hex floats, "-0", "-inf", "nan") that start
 * with a sign or a digit; quoting "-0" or "-1.5e-300" would make them text. Anything else in a
 * number column is treated as text, so a column declared numeric cannot carry a formula either.
 */
export function spreadsheetSafeCell(value: string | number, kind: 'text' | 'number'): string | number {
  if (typeof value === 'number') return value;
  if (!FORMULA_START.test(value)) return value;
  if (kind === 'number' && /^[+-]?[0-9.ni]/i.test(value) && numberString.safeParse(value).success) return value;
  return `'${value}`;
}
