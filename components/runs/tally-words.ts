import { OUTCOME_GLYPH } from './outcome-glyph';
import { STOPPED_BY_ERROR } from '../../shared/stopped-by-error';
import type { CellTally } from './tally-cells';

/** A tally of checks in words, each count with its glyph: "✓ 9 passed · ❌ 2 with failures · ◊ 8 stopped by an error". */
export function tallyWords(t: CellTally): string {
  return [
    `${OUTCOME_GLYPH.pass} ${t.pass} passed`,
    `${OUTCOME_GLYPH.fail} ${t.fail} with failures`,
    `${OUTCOME_GLYPH.error} ${t.error} ${STOPPED_BY_ERROR}`,
    ...(t.other ? [`${t.other} not finished or cancelled`] : []),
  ].join(' · ');
}
