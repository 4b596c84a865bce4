import { all, create } from 'mathjs';
import { answerContinue } from '../../../../harness/reference/continuation/answer-continue';
import { c } from './c';
import { circle } from './circle';
import { run } from './run-continue';

const math = create(all as NonNullable<typeof all>);

describe('monodromy of closed paths equals e^{2πiν(Z−P)} (argument principle)', () => {
  // Z and P are counted by hand from each g's factorisation; the argument principle says
  // Δarg g around a simple positively oriented loop is 2π(Z − P), so the factor is e^{2πiν(Z−P)}.
  const cases: [string, string, ReturnType<typeof circle>, number, string][] = [
    ['z^3 - 1', '1/3', circle(c(0), '2'), 3, 'all three cube roots of 1 inside'],
    ['z^3 - 1', '1/3', circle(c(1), '0.5'), 1, 'only the root 1 inside'],
    ['(z - 1)/(z + 1)^2', '1/2', circle(c(0), '3'), 1 - 2, 'one simple zero, one double pole'],
    ['z^2 - 1', '1/2', circle(c(0), '3', 2, 'cw'), -4, 'two zeros, two turns clockwise'],
    ['z*exp(z)', '1/4', circle(c(0), '1'), 1, 'exp factors have no zeros'],
  ];
  it.each(cases)('gives e^{2πiν(Z−P)} for %s^%s around %#', (g, nu, path, windings) => {
    const answer = run({
      g,
      nu,
      z0: path.center.re === '0' ? c(Number(path.radius)) : c(Number(path.center.re) + Number(path.radius)),
      k: 0,
      path,
      at: ['1'],
    });
    const nuValue = math.fraction(nu).valueOf() as number;
    const angle = 2 * Math.PI * nuValue * windings;
    expect(Number(answer.monodromy?.re ?? 'nan')).toBeCloseTo(Math.cos(angle), 12);
    expect(Number(answer.monodromy?.im ?? 'nan')).toBeCloseTo(Math.sin(angle), 12);
  });

  it('gives e^{2πiν} for complex ν = 1/3 + i/5 once around a simple zero', () => {
    const answer = run({ g: 'z - 1', nu: c('1/3', '1/5'), z0: c(2), k: 0, path: circle(c(1), '1'), at: ['1'] });
    const modulus = Math.exp(-2 * Math.PI * 0.2);
    expect(Number(answer.monodromy?.re ?? 'nan')).toBeCloseTo(modulus * Math.cos((2 * Math.PI) / 3), 12);
    expect(Number(answer.monodromy?.im ?? 'nan')).toBeCloseTo(modulus * Math.sin((2 * Math.PI) / 3), 12);
  });
});

/** f0 · exp(ν ∫ g'/g dz) along the path by Gauss–Legendre quadrature in doubles, with g' from mathjs's symbolic derivative. */
function byQuadrature(
  g: string,
  nu: [number, number],
  f0: [number, number],
  point: (t: number) => [number, number],
  velocity: (t: number) => [number, number],
  t1: number,
): [number, number] {
  const ratio = math.parse(`(${math.derivative(g, 'z').toString()}) / (${g})`).compile();
  // 5-point Gauss–Legendre nodes and weights on [−1, 1]: the closed forms 0, ±⅓√(5 ∓ 2√(10/7)) with weights
  // 128/225 and (322 ± 13√70)/900, rounded to double (the usual source, Abramowitz & Stegun table 25.4, was not read).
  const nodes = [0, -0.5384693101056831, 0.5384693101056831, -0.906179845938664, 0.906179845938664];
  const weights = [
    0.5688888888888889, 0.47862867049936647, 0.47862867049936647, 0.23692688505618908, 0.23692688505618908,
  ];
  const panels = 400;
  let acc = math.complex(0, 0);
  for (let k = 0; k < panels; k++) {
    const a = (k / panels) * t1;
    const b = ((k + 1) / panels) * t1;
    nodes.forEach((x, i) => {
      const t = (a + b) / 2 + ((b - a) / 2) * x;
      const [zr, zi] = point(t);
      const [vr, vi] = velocity(t);
      const dz = math.complex(vr, vi);
      const value = ratio.evaluate({ z: math.complex(zr, zi) });
      acc = math.add(acc, math.multiply(value, dz, ((b - a) / 2) * (weights[i] as number))) as math.Complex;
    });
  }
  const w = math.multiply(math.complex(nu[0], nu[1]), acc) as math.Complex;
  const v = math.multiply(math.complex(f0[0], f0[1]), math.exp(w)) as math.Complex;
  return [v.re, v.im];
}

describe('continuation endpoints against quadrature of g′/g', () => {
  const cases: [string, [string, string], number][] = [
    ['z^2 - 1', ['1/2', '0'], 0.8],
    ['(z^2 + 1)/(z - 3)', ['1/3', '0'], 1],
    ['z^3 - 2*z + 1', ['2/5', '1/7'], 1],
    ['(z - 1/2)*exp(z^2)', ['-3/4', '0'], 0.6],
  ];
  it.each(cases)('agrees for %s^ν around the circle |z| = 2 to 10 digits', (g, nu, t1) => {
    const answer = run({ g, nu: c(nu[0], nu[1]), z0: c(2), f0: c(1), path: circle(c(0), '2'), at: [String(t1)] });
    const point = (t: number): [number, number] => [2 * Math.cos(2 * Math.PI * t), 2 * Math.sin(2 * Math.PI * t)];
    const nuD: [number, number] = [math.fraction(nu[0]).valueOf() as number, math.fraction(nu[1]).valueOf() as number];
    const velocity = (t: number): [number, number] => [
      -4 * Math.PI * Math.sin(2 * Math.PI * t),
      4 * Math.PI * Math.cos(2 * Math.PI * t),
    ];
    const [re, im] = byQuadrature(g, nuD, [1, 0], point, velocity, t1);
    const f = answer.values[0]?.f ?? c('nan', 'nan');
    expect(Number(f.re)).toBeCloseTo(re, 10);
    expect(Number(f.im)).toBeCloseTo(im, 10);
  });
});

/** √ on the unit circle with f0 = 1 at 1 is e^{iθ/2}, θ the argument measured continuously from 0 inside the cut plane. */
function expectHalfAngles(answer: ReturnType<typeof run>, thetas: number[]): void {
  answer.values.forEach((v, i) => {
    const theta = thetas[i] as number;
    expect(Number(v.f.re)).toBeCloseTo(Math.cos(theta / 2), 14);
    expect(Number(v.f.im)).toBeCloseTo(Math.sin(theta / 2), 14);
  });
}

/** √z from f0 = 1 at z0 = 1 once around the unit circle, on the plane cut from 0 along the ray through `cut`. */
function sqrtAroundUnitCircle(cut: ReturnType<typeof c>[]) {
  return run({
    g: 'z',
    nu: '1/2',
    z0: c(1),
    f0: c(1),
    path: circle(c(0), '1', 1),
    at: ['1/8', '3/8', '5/8', '7/8'],
    cuts: [{ points: cut, to_infinity: true }],
  });
}

describe('continuation along a polyline against quadrature of g′/g', () => {
  it('agrees for ((z² + 1)·exp(z/3))^(1/3) from 2 to −2 by way of 2i, around the zero at i (10 digits)', () => {
    const answer = run({
      g: '(z^2 + 1)*exp(z/3)',
      nu: '1/3',
      z0: c(2),
      f0: c(1),
      path: { kind: 'polyline', points: [c(2), c(0, 2), c(-2)] },
      at: ['1'],
    });
    // Two segments of equal length: t ∈ [0, ½] on the first, [½, 1] on the second.
    const point = (t: number): [number, number] => (t <= 0.5 ? [2 - 4 * t, 4 * t] : [2 - 4 * t, 4 - 4 * t]);
    const velocity = (t: number): [number, number] => (t < 0.5 ? [-4, 4] : [-4, -4]);
    const [re, im] = byQuadrature('(z^2 + 1)*exp(z/3)', [1 / 3, 0], [1, 0], point, velocity, 1);
    expect(Number(answer.values[0]?.f.re ?? 'nan')).toBeCloseTo(re, 10);
    expect(Number(answer.values[0]?.f.im ?? 'nan')).toBeCloseTo(im, 10);
  });
});

describe('regular branches with cut layouts', () => {
  it('reproduces the principal square root on the plane cut along (−∞, 0] (f0 = 1 at z0 = 1)', () => {
    const answer = sqrtAroundUnitCircle([c(0), c(-1)]);
    // Principal √ at e^{iθ} is e^{iθ/2} with θ ∈ (−π, π] (DLMF 4.2.5).
    expectHalfAngles(answer, [Math.PI / 4, (3 * Math.PI) / 4, (-3 * Math.PI) / 4, -Math.PI / 4]);
  });

  it('follows a cut along the positive imaginary axis: arg taken in (−3π/2, π/2]', () => {
    const answer = sqrtAroundUnitCircle([c(0), c(0, 1)]);
    expectHalfAngles(answer, [
      Math.PI / 4,
      (3 * Math.PI) / 4 - 2 * Math.PI,
      (5 * Math.PI) / 4 - 2 * Math.PI,
      (7 * Math.PI) / 4 - 2 * Math.PI,
    ]);
  });

  it('returns to f0 around a loop that crosses the cut between the branch points of √(z²−1)', () => {
    const answer = run({
      g: 'z^2 - 1',
      nu: '1/2',
      z0: c(0, 1),
      k: 0,
      path: circle(c(1), '1'),
      at: ['0', '1'],
      cuts: [{ points: [c(-1), c(1)], to_infinity: false }],
    });
    expect(answer.values[1]?.f).toEqual(answer.values[0]?.f);
    expect(Number(answer.monodromy?.re ?? 'nan')).toBeCloseTo(-1, 14);
  });

  it('takes f0 as the k-th value principal·e^{2πiνk}: (−1)^{1/3} with k = 1 is −1', () => {
    const answer = run({
      g: 'z',
      nu: '1/3',
      z0: c(-1),
      k: 1,
      path: { kind: 'polyline', points: [c(-1), c(-1, 1)] },
      at: ['0'],
    });
    expect(Number(answer.values[0]?.f.re ?? 'nan')).toBeCloseTo(-1, 30);
    expect(Number(answer.values[0]?.f.im ?? 'nan')).toBeCloseTo(0, 30);
  });
});

describe('refusals', () => {
  const base = { nu: '1/2', z0: c(2), k: 0, path: circle(c(0), '1'), at: ['1'] };

  it('refuses a path through a zero of g, naming where', () => {
    expect(answerContinue({ ...base, g: 'z - 1', z0: c(2), path: { kind: 'polyline', points: [c(2), c(0)] } })).toEqual(
      {
        error: 'the path near t = 0.5 passes through a zero of g of order 1 at (1, 0)',
      },
    );
  });

  it('refuses z0 at a pole of g', () => {
    expect(answerContinue({ ...base, g: '1/(z - 2)' })).toEqual({ error: 'z0 is a pole of g of order 1 at (2, 0)' });
  });

  it('names a branch point that lies on no cut', () => {
    expect(answerContinue({ ...base, g: 'z^2 - 1', cuts: [{ points: [c(1), c(5)], to_infinity: true }] })).toEqual({
      error:
        'the branch point at (-1, 0) lies on no cut: it is a zero of g of order 1, and going once around it multiplies the value by e^{2πi·1/2}, so a cut must start or end there',
    });
  });

  it('names the loop whose monodromy is not 1 when a finite cut ends at only one branch point', () => {
    const answer = answerContinue({
      ...base,
      g: 'z*(z - 1)*(z + 3)',
      nu: '1/3',
      cuts: [{ points: [c(0), c(1)] }, { points: [c(-3), c(-4)], to_infinity: true }],
    });
    expect(answer).toEqual({
      error:
        'a loop around the cut through (0, 0), (1, 0) crosses no cut, yet going once around it multiplies the value by e^{2πi·2/3}, not 1: extend that cut to another branch point or to infinity',
    });
  });

  it('refuses cuts that close a loop', () => {
    const answer = answerContinue({ ...base, g: 'z', cuts: [{ points: [c(0), c(-1), c(-1, -1), c(0)] }] });
    expect(String(answer.error)).toMatch(/^the cuts close a loop at/);
  });

  it('refuses z0 on a cut', () => {
    expect(
      answerContinue({
        ...base,
        g: 'z',
        z0: c(-2),
        path: circle(c(-2), '0.5'),
        cuts: [{ points: [c(0), c(-1)], to_infinity: true }],
      }),
    ).toEqual({
      error: 'z0 = (-2, 0) lies on a cut, where the branch is not fixed',
    });
  });

  it('refuses a g outside rational functions times exp factors', () => {
    expect(answerContinue({ ...base, g: 'sqrt(z)' })).toEqual({
      error: 'g must be built from z, numbers, i, + − × ÷, integer powers and exp of such terms; "sqrt" is not allowed',
    });
  });
});

describe('answer shape', () => {
  it('answers the requested t values in the order given, echoing each as written', () => {
    const answer = run({ g: 'z', nu: '1/2', z0: c(1), f0: c(1), path: circle(c(0), '1'), at: ['0.5', '1/4', '0'] });
    expect(answer.values.map((v) => v.t)).toEqual(['0.5', '1/4', '0']);
    expect(answer.values[2]?.f).toEqual(c(1));
  });
});

describe('exact angles and turns in a continue request', () => {
  // A suite's circle already takes "pi/2" and "1/3" exactly; the CLI's request reads them the
  // same way. cos and sin of π/2 + 2π/3 = 7π/6 are −√3/2 and −1/2 (common practice).
  it('starts a circle at exactly i for start_angle "pi/2" and ends a third of a turn on at exactly −1/2 imaginary', () => {
    const answer = run({
      g: 'z',
      nu: '1/2',
      z0: c(0, 1),
      k: 0,
      path: circle(c(0), '1', '1/3' as never, 'ccw', 'pi/2'),
      at: ['0', '1'],
    });
    expect(answer.values[0]!.z).toEqual({ re: '0', im: '1' });
    expect(answer.values[1]!.z.im).toBe('-0.5');
  });

  it('reads turns written as a JSON number as the decimal written, and refuses zero turns naming the field', () => {
    const quarter = run({ g: 'z', nu: '1/2', z0: c(1), k: 0, path: circle(c(0), '1', 0.25), at: ['1'] });
    // A quarter turn from 1 ends at exactly i.
    expect(quarter.values[0]!.z).toEqual({ re: '0', im: '1' });
    expect(answerContinue({ g: 'z', nu: '1/2', z0: c(1), k: 0, path: circle(c(0), '1', 0), at: ['1'] })).toEqual({
      error: 'path.turns must be non-zero and at most 64',
    });
  });
});
