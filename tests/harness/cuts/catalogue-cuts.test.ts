import { catalogueCuts } from '../../../harness/cuts/catalogue-cuts';

describe('catalogueCuts', () => {
  // DLMF 4.23.19: arcsin is cut along (−∞, −1] and [1, ∞); casin z = −i casinh(iz) (ISO/IEC 9899:2011 G.6 paragraph 7) the same.
  it('gives asin two rays from -1 and 1 outwards, closed from above and from below under Kahan', () => {
    expect(catalogueCuts('asin')).toEqual([
      { from: [-1, 0], to: [-2, 0], toInfinity: true, ccwSide: 'upper', label: '(-inf, -1]' },
      { from: [1, 0], to: [2, 0], toInfinity: true, ccwSide: 'lower', label: '[1, +inf)' },
    ]);
  });

  it('gives every power the cut (-inf, 0] and exp none', () => {
    expect(catalogueCuts('pow')).toEqual([
      { from: [0, 0], to: [-1, 0], toInfinity: true, ccwSide: 'upper', label: '(-inf, 0]' },
    ]);
    expect(catalogueCuts('exp')).toEqual([]);
    expect(catalogueCuts('sin')).toBeNull();
  });

  it('gives the reciprocal functions finite cuts without a named closed side', () => {
    expect(catalogueCuts('acoth')!.map((c) => [c.from, c.to, c.toInfinity, c.ccwSide])).toEqual([
      [[-1, 0], [0, 0], false, null],
      [[0, 0], [1, 0], false, null],
    ]);
  });
});
