import { subjectCuts } from '../../../harness/cuts/subject-cuts';
import { parseSubject } from '../../../harness/expressions/parse-subject';

const principal = { kind: 'principal' as const };

describe('subjectCuts', () => {
  it('takes the catalogue cuts for one function of z and refuses a composition', () => {
    expect(subjectCuts(parseSubject('atanh(z)'), principal)?.map((c) => c.label)).toEqual(['(-inf, -1]', '[1, +inf)']);
    expect(subjectCuts(parseSubject('pow(z, 1/3)'), principal)?.map((c) => c.label)).toEqual(['(-inf, 0]']);
    expect(subjectCuts(parseSubject('z^2'), principal)).toEqual([]);
    expect(subjectCuts(parseSubject('sqrt(z^2 - 1)'), principal)).toBeNull();
  });

  it("takes a regular branch's layout piece by piece, the last piece of a cut to infinity as a ray", () => {
    const branch = {
      kind: 'regular' as const,
      g: 'z^2 - 1',
      nu: '1/2',
      z0: { re: '2', im: '0' },
      k: 0,
      cuts: [
        {
          points: [
            { re: '-1', im: '0' },
            { re: '0', im: '0' },
            { re: '1', im: '0' },
          ],
          to_infinity: false,
        },
        {
          points: [
            { re: '0', im: '1' },
            { re: '0', im: '2' },
          ],
          to_infinity: true,
        },
      ],
    };
    expect(subjectCuts(parseSubject('sqrt(z - 1) * sqrt(z + 1)'), branch)).toEqual([
      { from: [-1, 0], to: [0, 0], toInfinity: false, ccwSide: null, label: 'cut 1 piece 1' },
      { from: [0, 0], to: [1, 0], toInfinity: false, ccwSide: null, label: 'cut 1 piece 2' },
      { from: [0, 1], to: [0, 2], toInfinity: true, ccwSide: null, label: 'cut 2 piece 1' },
    ]);
  });
});
