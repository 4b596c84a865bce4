import { BigComplex } from '../../../harness/reference/complex/big-complex';
import { evaluateFunction } from '../../../harness/reference/evaluate-function';
import { askPython } from '../../external/python-oracle';
import { unhex } from '../../external/unhex';

/** The working precision principalValue starts at for the double and 40 digits. */
const FIRST_BITS = 145;
const WANT_BITS = 137;

describe('evaluateFunction', () => {
  it.each([
    ['acsch', -1.1773881765363772e-114, 7.442289407197986e225],
    ['acot', 4.523199903472384e107, 2.843133582768684e-104],
  ])('settles %s(%d + %di), whose parts are far apart, at the first working precision', (fn, x, y) => {
    const a = evaluateFunction({ fn, z: BigComplex.fromDoubles(x, y), convention: 'signed-zero' }, FIRST_BITS);
    expect(a.decided(true, WANT_BITS)).toBe(true);
    // mpmath, 60 digits on 720 + 2·(orders between the parts) working digits (Debian python3-mpmath).
    const orders = Math.ceil(Math.abs(Math.log10(Math.abs(x)) - Math.log10(Math.abs(y))));
    const [m] = askPython<{ re_rounded: string; im_rounded: string }>('mpmath', [
      { fn, z: [String(x), String(y)], work_dps: 720 + 2 * orders },
    ]);
    expect([a.re.toDouble(), a.im.toDouble()]).toEqual([unhex(m!.re_rounded), unhex(m!.im_rounded)]);
  });
});
