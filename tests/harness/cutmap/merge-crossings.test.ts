import type { GridCrossing } from '../../../harness/cutmap/grid-crossing';
import { mergeCrossings } from '../../../harness/cutmap/merge-crossings';

const v = (row: number, column: number, re: number, im: number): GridCrossing => ({
  at: [re, im],
  edge: { kind: 'v', row, column },
});
const h = (row: number, column: number, re: number, im: number): GridCrossing => ({
  at: [re, im],
  edge: { kind: 'h', row, column },
});

describe('mergeCrossings', () => {
  it('joins crossings of neighbouring vertical edges into one segment ordered along it', () => {
    expect(mergeCrossings([v(4, 2, -2, -1e-9), v(4, 0, -4, -1e-9), v(4, 1, -3, -1e-9)])).toEqual([
      [
        [-4, -1e-9],
        [-3, -1e-9],
        [-2, -1e-9],
      ],
    ]);
  });

  it('keeps crossings apart when no cell has both on its sides', () => {
    expect(mergeCrossings([v(4, 0, -4, 0), v(4, 8, 4, 0)])).toHaveLength(2);
  });

  it('orders a vertical run of crossings on horizontal edges by the imaginary part', () => {
    expect(mergeCrossings([h(3, 5, 1e-9, 3), h(1, 5, 1e-9, 1), h(2, 5, 1e-9, 2)])).toEqual([
      [
        [1e-9, 1],
        [1e-9, 2],
        [1e-9, 3],
      ],
    ]);
  });
});
