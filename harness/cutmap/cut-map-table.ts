import type { CutMap } from '../../shared/cut-map';
import type { WireComplex } from '../../shared/wire-complex';
import { formatComplexText } from '../../shared/format-complex-text';

/** A cut map as plain text: the verdict and statement, each expected cut with its coverage, each observed segment with its ends. */
export function cutMapTable(map: CutMap): string {
  const w = (p: WireComplex) => formatComplexText(p, { ascii: true });
  return [
    `cut map of ${map.function} for ${map.target} over ${w(map.box.min)} .. ${w(map.box.max)}: ${map.verdict}`,
    map.statement,
    '',
    'expected cuts:',
    ...map.expected.map(
      (e) =>
        `  ${e.label.padEnd(14)} ${w(e.from)} .. ${w(e.to)}  ${e.coverage === null ? 'crosses no grid line' : `found on ${Math.round(e.coverage * 100)}% of the grid lines crossing it`}${e.seen ? '' : '  NOT SEEN'}`,
    ),
    'observed discontinuities:',
    ...map.observed.map(
      (o) =>
        `  ${o.onExpectedCut ? 'on an expected cut ' : 'UNEXPECTED         '} ${w(o.points[0]!)} .. ${w(o.points[o.points.length - 1]!)}  (${o.points.length} crossings)`,
    ),
    ...(map.observed.length === 0 ? ['  none'] : []),
    ...(map.notFinite > 0 ? [`${map.notFinite} grid point(s) without a finite value`] : []),
  ].join('\n');
}
