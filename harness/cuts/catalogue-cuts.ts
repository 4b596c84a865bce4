import { catalogueEntry } from '../catalogue/catalogue-entry';
import type { Cut } from '../reference/functions/cut';
import type { PlaneCut } from './plane-cut';

const text = (x: number): string => (x === -Infinity ? '-inf' : x === Infinity ? '+inf' : String(x));

/**
 * The cuts of a catalogue function as the reference engine declares them (each function's
 * `cuts` in harness/reference/functions, POWER_CUTS for powers and roots), as segments and rays
 * in the plane. An axis cut with an infinite end becomes a ray from its finite end; a cut
 * infinite at both ends is not in the catalogue. Returns null for a name the catalogue does not know; exp has no cuts.
 */
export function catalogueCuts(fn: string): PlaneCut[] | null {
  const entry = catalogueEntry(fn)?.reference;
  if (!entry) return null;
  const cuts: readonly (Cut | Omit<Cut, 'ccwSide'>)[] = entry.kind === 'power' ? entry.cuts : entry.fn.cuts;
  return cuts.map((cut) => {
    const at = (x: number): [number, number] => (cut.axis === 'real' ? [x, 0] : [0, x]);
    const unit = cut.axis === 'real' ? '' : '·i';
    const label = `${cut.from === -Infinity ? '(' : '['}${text(cut.from)}, ${text(cut.to)}${cut.to === Infinity ? ')' : ']'}${unit}`;
    const ccwSide = 'ccwSide' in cut ? cut.ccwSide : null;
    if (cut.from === -Infinity) return { from: at(cut.to), to: at(cut.to - 1), toInfinity: true, ccwSide, label };
    if (cut.to === Infinity) return { from: at(cut.from), to: at(cut.from + 1), toInfinity: true, ccwSide, label };
    return { from: at(cut.from), to: at(cut.to), toInfinity: false, ccwSide, label };
  });
}
