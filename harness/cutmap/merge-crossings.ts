import type { ComplexPair } from '../adapters/complex-pair';
import type { GridCrossing } from './grid-crossing';

/**
 * Groups crossings into segments: two crossings belong together when their grid edges are
 * sides of the same cell (as in marching squares), and a group is the connected set. Each
 * group comes back as a polyline ordered along its longer extent (by re when it is wider than
 * tall, else by im) — exact for the straight cuts of the catalogue, a sketch for curved ones.
 */
export function mergeCrossings(crossings: readonly GridCrossing[]): ComplexPair[][] {
  const parent = crossings.map((_, i) => i);
  const find = (i: number): number => (parent[i] === i ? i : (parent[i] = find(parent[i]!)));
  const byCell = new Map<string, number[]>();
  crossings.forEach((c, i) => {
    const { kind, row, column } = c.edge;
    // The cells an edge borders: below/above a horizontal edge, left/right of a vertical one.
    const cells =
      kind === 'h'
        ? [
            [row - 1, column],
            [row, column],
          ]
        : [
            [row, column - 1],
            [row, column],
          ];
    for (const [r, k] of cells) {
      const key = `${r},${k}`;
      byCell.set(key, [...(byCell.get(key) ?? []), i]);
    }
  });
  for (const members of byCell.values()) for (const i of members.slice(1)) parent[find(i)] = find(members[0]!);
  const groups = new Map<number, ComplexPair[]>();
  crossings.forEach((c, i) => groups.set(find(i), [...(groups.get(find(i)) ?? []), c.at]));
  return [...groups.values()].map((points) => {
    const res = points.map((p) => p[0]);
    const ims = points.map((p) => p[1]);
    const wide = Math.max(...res) - Math.min(...res) >= Math.max(...ims) - Math.min(...ims);
    return [...points].sort((p, q) => (wide ? p[0] - q[0] || p[1] - q[1] : p[1] - q[1] || p[0] - q[0]));
  });
}
