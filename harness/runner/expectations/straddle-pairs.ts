import type { PathPoint } from '../../paths/path-point';

const SWAP: Readonly<Record<string, string>> = { above: 'below', below: 'above', left: 'right', right: 'left' };

/**
 * For each point of a straddle path, the index of its mirror image across the cut (same
 * place along the cut, same offset, other side), or −1 for points on the cut and unlabelled
 * points. Labels are straddle-path.ts's: "above 1e-9", "below 1e-9 (nearest double)".
 */
export function straddlePairs(points: readonly PathPoint[]): number[] {
  const key = (t: number, label: string) => `${t}|${label.replace(' (nearest double)', '')}`;
  const byKey = new Map<string, number>();
  points.forEach((p, i) => {
    if (p.label) byKey.set(key(p.t, p.label), i);
  });
  return points.map((p) => {
    const match = p.label ? /^(above|below|left|right) (.*)$/.exec(p.label.replace(' (nearest double)', '')) : null;
    if (!match) return -1;
    return byKey.get(key(p.t, `${SWAP[match[1] as string]} ${match[2]}`)) ?? -1;
  });
}
