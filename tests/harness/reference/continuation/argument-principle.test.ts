import fc from 'fast-check';
import { c } from './c';
import { circle } from './circle';
import { run } from './run-continue';

// The argument principle: around a circle (positively oriented, `turns` times) the argument of
// g = Π (z − a_j)^{m_j} changes by 2π·turns·Σ_{|a_j − c| < r} m_j, so g^ν comes back multiplied by
// e^{2πiν·turns·(Z − P)}. Zeros (m > 0) and poles (m < 0) are drawn at random; the test counts the
// ones inside the circle itself.
const SEED = 5150;

const root = fc.record({
  re: fc.integer({ min: -40, max: 40 }),
  im: fc.integer({ min: -40, max: 40 }),
  m: fc.constantFrom(-2, -1, 1, 2, 3),
});

describe('continuation around random circles', () => {
  it('multiplies by e^{2πiν·turns·(Z−P)} for random zeros, poles, ν and circles (argument principle)', () => {
    fc.assert(
      fc.property(
        fc.array(root, { minLength: 1, maxLength: 3 }),
        fc.integer({ min: 1, max: 11 }),
        fc.integer({ min: 2, max: 9 }),
        fc.integer({ min: 5, max: 60 }),
        fc.constantFrom(1, 2, -1),
        (roots, p, q, radius, turns) => {
          const r = radius / 10;
          // Keep every zero and pole at least 0.05 away from the circle.
          if (roots.some((a) => Math.abs(Math.hypot(a.re / 10, a.im / 10) - r) < 0.05)) return true;
          const g = roots.map((a) => `(z - (${a.re}/10 + ${a.im}/10*i))^${a.m}`).join(' * ');
          const answer = run({
            g,
            nu: `${p}/${q}`,
            z0: c(String(r)),
            k: 0,
            path: circle(c(0), String(r), Math.abs(turns), turns > 0 ? 'ccw' : 'cw'),
            at: ['1'],
          });
          const inside = roots.filter((a) => Math.hypot(a.re / 10, a.im / 10) < r).reduce((s, a) => s + a.m, 0);
          const angle = 2 * Math.PI * (p / q) * turns * inside;
          const m = answer.monodromy ?? c('nan', 'nan');
          return Math.abs(Number(m.re) - Math.cos(angle)) < 1e-12 && Math.abs(Number(m.im) - Math.sin(angle)) < 1e-12;
        },
      ),
      { seed: SEED, numRuns: 25 },
    );
  }, 60_000);
});
