import fc from 'fast-check';
import { spreadsheetSafeCell } from '../../../server/failures/spreadsheet-safe-cell';

const SEED = 11_0010;

describe('spreadsheetSafeCell', () => {
  it('quotes text that starts like a formula', () => {
    for (const v of ['=HYPERLINK("http://x.test","click")', '+1+1', '-2+3', '@SUM(A1)', '\t=1', '\r=1'])
      expect(spreadsheetSafeCell(v, 'text')).toBe(`'${v}`);
  });

  it('leaves other text as it is', () => {
    for (const v of ['straddle cut 1', 'complex.js@2.4.3', "'already", '', 'a=b'])
      expect(spreadsheetSafeCell(v, 'text')).toBe(v);
  });

  it('keeps the numbers of a number column, signed zeros and hex floats included', () => {
    for (const v of ['-0', '-1.5e-300', '+2', '-0x1p-1074', '-inf', '-nan', '-4', 0, -0, -1.5e-300])
      expect(spreadsheetSafeCell(v, 'number')).toBe(v);
  });

  it('quotes a formula even in a number column', () => {
    for (const v of ['=1+1', '-1+cmd|x', '@A1', '\t-1', '-HYPERLINK("x")'])
      expect(spreadsheetSafeCell(v, 'number')).toBe(`'${v}`);
  });

  it('never leaves a written cell starting with = + - @ tab or CR unless it is a number of a number column', () => {
    // Law: for any string s and either kind, the cell starts with a formula character only when
    // the column is numeric and the cell is s itself, a number string.
    fc.assert(
      fc.property(
        fc.constantFrom('=', '+', '-', '@', '\t', '\r', ''),
        fc.string({ maxLength: 20 }),
        fc.constantFrom('text' as const, 'number' as const),
        (start, rest, kind) => {
          const cell = String(spreadsheetSafeCell(start + rest, kind));
          if (/^[=+\-@\t\r]/.test(cell)) {
            expect(kind).toBe('number');
            expect(cell).toMatch(/^[+-]?(\d|\.\d|0x|inf|nan)/i);
          }
        },
      ),
      { seed: SEED, numRuns: 1000, verbose: true },
    );
  });
});
