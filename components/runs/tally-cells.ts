import type { Tone } from './outcome-tone';

export interface CellTally {
  total: number;
  pass: number;
  fail: number;
  error: number;
  /** Not finished (waiting or running) or cancelled. */
  other: number;
}

/**
 * A run's checks (suite × library version cells) counted by the tone describeMatrixCell gives
 * each, so the header and the matrix count errors by one rule: a check that checked nothing is
 * an error there and here, whatever its point counts say.
 */
export function tallyCells(cells: readonly { tone: Tone }[]): CellTally {
  const tally: CellTally = { total: cells.length, pass: 0, fail: 0, error: 0, other: 0 };
  for (const { tone } of cells) {
    if (tone === 'pass') tally.pass += 1;
    else if (tone === 'fail') tally.fail += 1;
    else if (tone === 'error') tally.error += 1;
    else tally.other += 1;
  }
  return tally;
}
