import type { ComplexDouble } from '../../../harness/checks/complex-double';
import { libraryMonodromy } from '../../../harness/checks/library-monodromy';

const N = 65;
const t = Array.from({ length: N }, (_, i) => i / (N - 1));
const circle = t.map((s): ComplexDouble => [Math.cos(2 * Math.PI * s), Math.sin(2 * Math.PI * s)]);
const principalPow = (z: ComplexDouble, nu: number): ComplexDouble => {
  const r = Math.hypot(...z) ** nu;
  const a = Math.atan2(z[1], z[0]) * nu;
  return [r * Math.cos(a), r * Math.sin(a)];
};

describe('libraryMonodromy', () => {
  it('reads e^{2πi/3} from principal cube roots around 0 (one jump by e^{−2πi/3} across the negative axis)', () => {
    const m = libraryMonodromy(
      t,
      circle.map((z) => principalPow(z, 1 / 3)),
      [1 / 3, 0],
    );
    expect('factor' in m && m.jumps).toBe(1);
    if ('factor' in m) {
      expect(m.factor[0]).toBeCloseTo(Math.cos((2 * Math.PI) / 3), 12);
      expect(m.factor[1]).toBeCloseTo(Math.sin((2 * Math.PI) / 3), 12);
    }
  });

  it('says which point has no usable value', () => {
    const values: (ComplexDouble | null)[] = circle.map((z) => principalPow(z, 0.5));
    values[7] = null;
    expect(libraryMonodromy(t, values, [0.5, 0])).toEqual({ note: `no usable library value at t = ${t[7]}` });
  });
});
