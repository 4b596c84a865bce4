import { suitePicture } from '../../../harness/suites/suite-picture';
import { demoCatalogue } from '../../../scripts/demo-catalogue/demo-catalogue';

const find = (id: string) => JSON.parse(JSON.stringify(demoCatalogue().find((s) => s.id === id)!));

describe('suitePicture', () => {
  it('draws a regular branch with its layout and the branch points ±1 of √(z²−1)', () => {
    const picture = suitePicture(find('sqrt-z2-minus-1-finite-cut'));
    expect(picture.cuts).toEqual([
      {
        points: [
          { re: -1, im: 0 },
          { re: 1, im: 0 },
        ],
        toInfinity: false,
      },
    ]);
    expect(
      picture.branchPoints.map((p) => [Math.round(p.re * 1e9) / 1e9, Math.round(p.im * 1e9) / 1e9]).sort(),
    ).toEqual([
      [-1, 0],
      [1, 0],
    ]);
    const wide = picture.paths.find((p) => p.name === 'wide circle, no cut crossed')!;
    expect(wide.draw).toBe('line');
    expect(wide.points).toHaveLength(65);
    expect(wide.points[16]!.re).toBe(0);
    expect(wide.points[16]!.im).toBe(2);
    expect(picture.paths.find((p) => p.name === 'across the finite cut')!.draw).toBe('points');
    expect(picture.notes).toEqual([]);
  });

  it('leaves out zeros of g where ν·m is an integer', () => {
    const suite = find('sqrt-z2-minus-1-finite-cut');
    suite.branch.g = '(z - 1)^2 * (z + 1)';
    expect(suitePicture(suite).branchPoints).toHaveLength(1);
  });

  it('draws the catalogue cut of a principal root and says when a composite subject has cuts it does not compute', () => {
    const sqrt = suitePicture(find('sqrt-principal-sz'));
    expect(sqrt.cuts).toEqual([
      {
        points: [
          { re: 0, im: 0 },
          { re: -1, im: 0 },
        ],
        toInfinity: true,
      },
    ]);
    expect(sqrt.branchPoints).toEqual([{ re: 0, im: 0 }]);
    const composite = find('sqrt-principal-sz');
    composite.subject = 'sqrt(z^2 - 1)';
    const picture = suitePicture(composite);
    expect(picture.cuts).toEqual([]);
    expect(picture.notes.join(' ')).toMatch(/cuts of sqrt\(z\^2 - 1\) are not drawn/);
  });

  it('names an unfinished path instead of drawing it, and draws the rest', () => {
    const suite = find('sqrt-z2-minus-1-finite-cut');
    suite.paths[1].radius = '';
    const picture = suitePicture(suite);
    expect(picture.paths).toHaveLength(suite.paths.length - 1);
    expect(picture.notes).toEqual(['Path 2 is not drawn until its fields are valid.']);
  });

  it('draws at most 721 points of a densely sampled line', () => {
    const suite = find('sqrt-z2-minus-1-finite-cut');
    suite.paths[0].samples = 50_000;
    expect(suitePicture(suite).paths[0]!.points).toHaveLength(721);
  });
});
