import { catalogueCuts } from '../../../harness/cuts/catalogue-cuts';
import { onPlaneCut } from '../../../harness/cuts/on-plane-cut';

const [negativeAxis] = catalogueCuts('sqrt')!;
const acotCut = catalogueCuts('acot')![0]!;

describe('onPlaneCut', () => {
  // DLMF 4.2.2 and Figure 4.2.1: the principal branch of √ and Log is cut along (−∞, 0].
  it('puts -4 + 0i and -4 - 0i on the cut (-inf, 0] and -4 + 1e-300i off it', () => {
    expect(onPlaneCut(negativeAxis!, [-4, 0])).toBe(true);
    expect(onPlaneCut(negativeAxis!, [-4, -0])).toBe(true);
    expect(onPlaneCut(negativeAxis!, [-4, 1e-300])).toBe(false);
  });

  it('keeps the branch point 0 off the open cut and on the closed one', () => {
    expect(onPlaneCut(negativeAxis!, [0, 0])).toBe(false);
    expect(onPlaneCut(negativeAxis!, [0, 0], true)).toBe(true);
    expect(onPlaneCut(negativeAxis!, [4, 0], true)).toBe(false);
  });

  it("puts 0.5i on acot's cut [-i, i] and 2i off it", () => {
    expect(onPlaneCut(acotCut, [0, 0.5])).toBe(true);
    expect(onPlaneCut(acotCut, [-0, 0.5])).toBe(true);
    expect(onPlaneCut(acotCut, [0, 2])).toBe(false);
  });
});
