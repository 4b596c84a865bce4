import { catalogueCuts } from '../../../harness/cuts/catalogue-cuts';
import { clipCut } from '../../../harness/cutmap/clip-cut';

describe('clipCut', () => {
  it('clips the ray (-inf, 0] to the part inside the box', () => {
    expect(clipCut(catalogueCuts('sqrt')![0]!, [-4, -4], [4, 4])).toEqual([
      [0, 0],
      [-4, 0],
    ]);
  });

  it("clips asin's ray [1, +inf) at the box edge and drops (-inf, -1] when the box lies to its right", () => {
    const [left, right] = catalogueCuts('asin')!;
    expect(clipCut(right!, [0, -1], [3, 1])).toEqual([
      [1, 0],
      [3, 0],
    ]);
    expect(clipCut(left!, [0, -1], [3, 1])).toBeNull();
  });

  it('returns null for a cut that passes beside the box', () => {
    expect(clipCut(catalogueCuts('sqrt')![0]!, [-4, 1], [4, 2])).toBeNull();
  });
});
