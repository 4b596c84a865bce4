import type { SuiteInput } from '../../shared/schemas/suite-schema';

const z = (re: string, im: string) => ({ re, im });
const origin = z('0', '0');

/**
 * Regular branches of composite formulas. Each states the branch it wants — g, ν, a value at
 * z0 and the cut layout — and the subject is the formula a library user would write for it.
 * The scenario (who wrote them and why) is the demo team's.
 */
export const DEMO_REGULAR_SUITES: SuiteInput[] = [
  {
    id: 'sqrt-z2-minus-1-finite-cut',
    version: 1,
    title: '√(z²−1) with a single finite cut [−1, 1]',
    story:
      'Kwame’s conformal-map code needs √(z²−1) ≈ z at infinity with one cut on [−1, 1]. The product √(z−1)·√(z+1) of principal roots gives exactly that branch: the two cuts on (−∞, −1] cancel. A wide circle crosses no cut, so its monodromy must be 1.',
    subject: 'sqrt(z - 1) * sqrt(z + 1)',
    branch: { kind: 'regular', g: 'z^2 - 1', nu: '1/2', z0: z('2', '0'), k: 0, cuts: [{ points: [z('-1', '0'), z('1', '0')], to_infinity: false }] },
    convention: 'signed-zero',
    paths: [
      { kind: 'circle', name: 'wide circle, no cut crossed', center: origin, radius: '2', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 },
      { kind: 'circle', name: 'around +1', center: z('1', '0'), radius: '0.5', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 },
      { kind: 'straddle', name: 'across the finite cut', cut: { kind: 'segment', from: z('-1', '0'), to: z('1', '0') }, along: ['0.1', '0.5', '0.9'] },
      { kind: 'segment', name: 'along the negative real axis, where the principal cuts cancel', from: z('-5', '0'), to: z('-1.5', '0'), samples: 9 },
    ],
    tolerances: { values: { relative: 1e-14 }, monodromy: { relative: 1e-12 } },
    properties: [],
  },
  {
    id: 'sqrt-z2-minus-1-naive-formula',
    version: 1,
    title: '√(z²−1) written naively: the cuts it really has',
    story:
      'The same branch as the finite-cut suite, but with the subject a user types first: sqrt(z^2 - 1). Its principal root adds cuts along the whole imaginary axis, so this suite is expected to fail with misplaced cuts on every library — it shows what the diagnosis looks like.',
    subject: 'sqrt(z^2 - 1)',
    branch: { kind: 'regular', g: 'z^2 - 1', nu: '1/2', z0: z('2', '0'), k: 0, cuts: [{ points: [z('-1', '0'), z('1', '0')], to_infinity: false }] },
    convention: 'signed-zero',
    paths: [{ kind: 'circle', name: 'wide circle', center: origin, radius: '2', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 }],
    tolerances: { values: { relative: 1e-14 }, monodromy: { relative: 1e-12 } },
    properties: [],
  },
  {
    id: 'cube-root-of-z3-minus-1-star',
    version: 1,
    title: '∛(z³−1) with three cuts from 0 to the cube roots of unity',
    story:
      'Hanne’s reviewers asked for a branch with several branch points whose charges add to a whole number: the three cuts meet at 0, so a loop around all of them has monodromy e^{2πi} = 1. The subject z·∛(1 − 1/z³) gives that branch for the principal cube root.',
    subject: 'z * cbrt(1 - 1/z^3)',
    branch: {
      kind: 'regular',
      g: 'z^3 - 1',
      nu: '1/3',
      z0: z('2', '0'),
      k: 0,
      cuts: [
        { points: [origin, z('1', '0')], to_infinity: false },
        { points: [origin, z('-0.5', '0.8660254037844386')], to_infinity: false },
        { points: [origin, z('-0.5', '-0.8660254037844386')], to_infinity: false },
      ],
    },
    convention: 'signed-zero',
    paths: [
      { kind: 'circle', name: 'around all three branch points', center: origin, radius: '2', start_angle: '0', turns: '2', direction: 'ccw', samples: 97 },
      { kind: 'circle', name: 'around 1 alone', center: z('1', '0'), radius: '0.4', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 },
      { kind: 'straddle', name: 'across the cut to 1', cut: { kind: 'segment', from: origin, to: z('1', '0') }, along: ['0.5'] },
    ],
    tolerances: { values: { relative: 1e-13 }, monodromy: { relative: 1e-12 } },
    properties: [],
  },
  {
    id: 'complex-power-cut-down-the-imaginary-axis',
    version: 1,
    title: 'z^(1/2+i) with its cut along the negative imaginary axis',
    story:
      'Mei’s signal-processing users need z^ν continuous across the negative real axis. Rotating the logarithm moves the cut: exp((½+i)(log(−iz) + log i)) takes arg z in (−π/2, 3π/2]. With a complex ν, a turn around 0 multiplies by e^{2πiν} = −e^{−2π}.',
    subject: 'exp((0.5 + i) * (log(-i * z) + log(i)))',
    branch: { kind: 'regular', g: 'z', nu: z('1/2', '1'), z0: z('1', '0'), k: 0, cuts: [{ points: [origin, z('0', '-1')], to_infinity: true }] },
    convention: 'signed-zero',
    paths: [
      { kind: 'circle', name: 'unit circle from 1', center: origin, radius: '1', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 },
      { kind: 'segment', name: 'across the negative real axis', from: z('-2', '1'), to: z('-2', '-1'), samples: 11 },
    ],
    tolerances: { values: { relative: 1e-13 }, monodromy: { relative: 1e-12 } },
    properties: [],
  },
  {
    id: 'sqrt-of-a-moebius-map-with-a-pole',
    version: 1,
    title: '√((z−1)/(z+1)): a zero and a pole joined by one cut',
    story:
      'A rational g with a pole: the zero at 1 and the pole at −1 carry charges +½ and −½, so the single cut [−1, 1] is enough and a loop around both has monodromy 1. The principal root of the quotient has exactly this cut.',
    subject: 'sqrt((z - 1) / (z + 1))',
    branch: { kind: 'regular', g: '(z - 1) / (z + 1)', nu: '1/2', z0: z('3', '0'), k: 0, cuts: [{ points: [z('-1', '0'), z('1', '0')], to_infinity: false }] },
    convention: 'signed-zero',
    paths: [
      { kind: 'circle', name: 'around both ends', center: origin, radius: '2', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 },
      { kind: 'circle', name: 'around the pole', center: z('-1', '0'), radius: '0.5', start_angle: '0', turns: '1', direction: 'ccw', samples: 65 },
      { kind: 'straddle', name: 'across the cut', cut: { kind: 'segment', from: z('-1', '0'), to: z('1', '0') }, along: ['0.25', '0.75'] },
    ],
    tolerances: { values: { relative: 1e-14 }, monodromy: { relative: 1e-12 } },
    properties: [],
  },
  {
    id: 'sqrt-z2-minus-1-other-sheet',
    version: 2,
    title: '−√(z²−1): the same cut, the other value at z0 (k = 1)',
    story:
      'The finite-cut branch again, fixed by k = 1: the value at 2 is −√3 = principal·e^{2πi·½·1}. Under counter-clockwise continuity, so zero signs on the cut are ignored and the cut belongs to the side reached turning counter-clockwise about its first point: written from 1 to −1, that is its upper side, where −√(z−1)·√(z+1) of principal roots puts it. (Version 2 writes the cut from 1, which is what makes the upper side the closed one.)',
    subject: '-sqrt(z - 1) * sqrt(z + 1)',
    branch: { kind: 'regular', g: 'z^2 - 1', nu: '1/2', z0: z('2', '0'), k: 1, cuts: [{ points: [z('1', '0'), z('-1', '0')], to_infinity: false }] },
    convention: 'counter-clockwise',
    paths: [
      { kind: 'polyline', name: 'a loop through the upper half-plane', points: [z('2', '0'), z('0', '2'), z('-2', '0'), z('0', '-2'), z('2', '0')], samples: 81 },
      { kind: 'straddle', name: 'across the finite cut', cut: { kind: 'segment', from: z('-1', '0'), to: z('1', '0') }, along: ['0.5'] },
    ],
    tolerances: { values: { relative: 1e-14 }, monodromy: { relative: 1e-12 } },
    properties: [],
  },
];
