import type { DemoCut, DemoPrincipalFunction } from './demo-principal-function';

const negativeRealAxis: DemoCut = { kind: 'ray', from: ['0', '0'], through: ['-1', '0'] };
const realRaysFromOne: DemoCut[] = [
  { kind: 'ray', from: ['1', '0'], through: ['2', '0'] },
  { kind: 'ray', from: ['-1', '0'], through: ['-2', '0'] },
];
const imaginaryRaysFromI: DemoCut[] = [
  { kind: 'ray', from: ['0', '1'], through: ['0', '2'] },
  { kind: 'ray', from: ['0', '-1'], through: ['0', '-2'] },
];
const realUnitSegment: DemoCut = { kind: 'segment', from: ['-1', '0'], to: ['1', '0'] };
const imaginaryUnitSegment: DemoCut = { kind: 'segment', from: ['0', '-1'], to: ['0', '1'] };

const nearCuts = { kind: 'near-cuts' as const, distance: '1e-6' };
const disc = { kind: 'disc' as const, center: { re: '0', im: '0' }, radius: '4' };

/**
 * The cuts and branch points of every catalogue function's principal branch, from the DLMF
 * definitions (§4.2 log and powers, §4.23 inverse trigonometric, §4.37 inverse hyperbolic);
 * the reciprocal functions follow from f(1/z). The stories are the demo team's.
 */
export const DEMO_PRINCIPAL_FUNCTIONS: DemoPrincipalFunction[] = [
  {
    subject: 'sqrt(z)',
    slug: 'sqrt',
    title: 'Square root',
    cuts: [negativeRealAxis],
    branchPoints: [['0', '0']],
    radius: '1',
    laws: [
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'root-power', power: 2, region: disc },
      { law: 'range', region: nearCuts },
    ],
    story:
      'The release notes of our complex type promise csqrt semantics. This suite pins the values on both sides of the negative real axis, where a lost −0 turns 2i into −2i.',
  },
  {
    subject: 'cbrt(z)',
    slug: 'cbrt',
    title: 'Principal cube root',
    cuts: [negativeRealAxis],
    branchPoints: [['0', '0']],
    radius: '1',
    laws: [
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'root-power', power: 3, region: disc },
      { law: 'range', region: disc },
    ],
    story:
      'Users ask why cbrt(−8) is not −2. The principal cube root of −8 is 1 + √3·i; this suite keeps that choice from drifting to the real root on one side of the cut only.',
  },
  {
    subject: 'nthroot(z, 5)',
    slug: 'nthroot-5',
    title: 'Principal fifth root',
    cuts: [negativeRealAxis],
    branchPoints: [['0', '0']],
    radius: '1',
    laws: [
      { law: 'root-power', power: 5, region: disc },
      { law: 'range', region: disc },
    ],
    story:
      'The fifth root is built from pow in one library and from polar form in another; both must land on the principal sheet, arg in (−π/5, π/5].',
  },
  {
    subject: 'pow(z, 1/3)',
    slug: 'pow-third',
    title: 'Power with the exact exponent 1/3',
    cuts: [negativeRealAxis],
    branchPoints: [['0', '0']],
    radius: '1',
    laws: [
      { law: 'root-power', power: 3, region: disc },
      { law: 'conjugate-symmetry', region: nearCuts },
    ],
    story:
      'pow(z, 1/3) with the exponent given as the exact rational, not the double 0.333…: the reference keeps the two apart, so an error of a third of an ulp in the exponent shows up where |z| is large.',
  },
  {
    subject: 'pow(z, 0.5 + 2i)',
    slug: 'pow-complex',
    title: 'Power with a complex exponent',
    cuts: [negativeRealAxis],
    branchPoints: [['0', '0']],
    radius: '1',
    // No property: z^w with a non-real w is not conjugate-symmetric (conj(z^w) = conj(z)^conj(w)),
    // and arg z^w has no simple principal range; the paths carry this suite.
    laws: [],
    story:
      'A complex exponent makes the jump across the cut change the modulus, by e^{±4π}: values on the wrong side are off by a factor of about 286751, not just a sign.',
  },
  {
    subject: 'exp(z)',
    slug: 'exp',
    title: 'Exponential (no cut)',
    cuts: [],
    branchPoints: [],
    radius: '1',
    laws: [{ law: 'conjugate-symmetry', region: disc }],
    story:
      'exp has no cut; it is here so that every formula built on it is checked on a sound base, including e^{iπ} landing on −1 with a tiny imaginary part of the right sign.',
  },
  {
    subject: 'log(z)',
    slug: 'log',
    title: 'Principal logarithm',
    cuts: [negativeRealAxis],
    branchPoints: [['0', '0']],
    radius: '1',
    laws: [
      { law: 'exp-log', region: disc },
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'range', region: nearCuts },
      { law: 'unwinding', region: disc },
    ],
    story:
      'Im log z must lie in (−π, π], with −π reached only from below the cut under signed zeros. Every power and inverse function inherits this choice.',
  },
  {
    subject: 'asin(z)',
    slug: 'asin',
    title: 'Inverse sine',
    cuts: realRaysFromOne,
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [
      { law: 'odd-symmetry', region: disc },
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'range', region: nearCuts },
    ],
    story:
      'asin on (1, ∞) is where hand-written formulas go wrong most often: the two sides differ by the sign of the imaginary part, and the side must follow the sign of a zero imaginary part.',
  },
  {
    subject: 'acos(z)',
    slug: 'acos',
    title: 'Inverse cosine',
    cuts: realRaysFromOne,
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'range', region: nearCuts },
    ],
    story: 'acos = π/2 − asin only if both land on the same sides of their cuts; this suite checks acos on its own.',
  },
  {
    subject: 'atan(z)',
    slug: 'atan',
    title: 'Inverse tangent',
    cuts: imaginaryRaysFromI,
    branchPoints: [
      ['0', '1'],
      ['0', '-1'],
    ],
    radius: '0.5',
    laws: [
      { law: 'odd-symmetry', region: disc },
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'range', region: nearCuts },
    ],
    story:
      'The cuts of atan run up and down the imaginary axis from ±i; a zero real part decides the side, which formulas through log((1+iz)/(1−iz)) often lose.',
  },
  {
    subject: 'asinh(z)',
    slug: 'asinh',
    title: 'Inverse hyperbolic sine',
    cuts: imaginaryRaysFromI,
    branchPoints: [
      ['0', '1'],
      ['0', '-1'],
    ],
    radius: '0.5',
    laws: [
      { law: 'odd-symmetry', region: disc },
      { law: 'conjugate-symmetry', region: nearCuts },
    ],
    story:
      'asinh z = −i·asin(iz) moves the cuts to the imaginary axis; a library that implements it through asin must carry the zero signs through the rotation.',
  },
  {
    subject: 'acosh(z)',
    slug: 'acosh',
    title: 'Inverse hyperbolic cosine',
    cuts: [{ kind: 'ray', from: ['1', '0'], through: ['0', '0'] }],
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [
      { law: 'conjugate-symmetry', region: nearCuts },
      { law: 'range', region: nearCuts },
    ],
    story:
      'One cut, (−∞, 1], but two branch points on it: the values jump differently on (−1, 1) and on (−∞, −1), which catches formulas built from the wrong square roots.',
  },
  {
    subject: 'atanh(z)',
    slug: 'atanh',
    title: 'Inverse hyperbolic tangent',
    cuts: realRaysFromOne,
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [
      { law: 'odd-symmetry', region: disc },
      { law: 'conjugate-symmetry', region: nearCuts },
    ],
    story:
      'atanh has logarithmic branch points at ±1, so circles around them add ±iπ/2 per turn rather than flipping a sign.',
  },
  {
    subject: 'acot(z)',
    slug: 'acot',
    title: 'Inverse cotangent',
    cuts: [imaginaryUnitSegment],
    branchPoints: [
      ['0', '1'],
      ['0', '-1'],
    ],
    radius: '0.5',
    laws: [{ law: 'odd-symmetry', region: disc }],
    story:
      'acot z = atan(1/z) (DLMF 4.23.9) puts the cut on the segment [−i, i]; acot(±0) lies on it, and this suite records which side a library takes there.',
  },
  {
    subject: 'asec(z)',
    slug: 'asec',
    title: 'Inverse secant',
    cuts: [realUnitSegment],
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [{ law: 'conjugate-symmetry', region: nearCuts }],
    story:
      'asec z = acos(1/z) (DLMF 4.23.8): the cut is [−1, 1], and 1/z turns the sign of a zero imaginary part, so the sides swap relative to acos.',
  },
  {
    subject: 'acsc(z)',
    slug: 'acsc',
    title: 'Inverse cosecant',
    cuts: [realUnitSegment],
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [{ law: 'odd-symmetry', region: disc }],
    story:
      'acsc z = asin(1/z) (DLMF 4.23.7): same cut as asec, odd, and a favourite place for a lost −0 in the reciprocal.',
  },
  {
    subject: 'acoth(z)',
    slug: 'acoth',
    title: 'Inverse hyperbolic cotangent',
    cuts: [realUnitSegment],
    branchPoints: [
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.5',
    laws: [{ law: 'odd-symmetry', region: disc }],
    story: 'acoth z = atanh(1/z) (DLMF 4.37.9): its cut is [−1, 1], the complement of atanh’s.',
  },
  {
    subject: 'asech(z)',
    slug: 'asech',
    title: 'Inverse hyperbolic secant',
    cuts: [negativeRealAxis, { kind: 'ray', from: ['1', '0'], through: ['2', '0'] }],
    branchPoints: [
      ['0', '0'],
      ['1', '0'],
      ['-1', '0'],
    ],
    radius: '0.4',
    laws: [{ law: 'conjugate-symmetry', region: nearCuts }],
    story:
      'asech z = acosh(1/z) (DLMF 4.37.8) has two cuts, (−∞, 0] and [1, ∞); −1 is a branch point inside the first.',
  },
  {
    subject: 'acsch(z)',
    slug: 'acsch',
    title: 'Inverse hyperbolic cosecant',
    cuts: [imaginaryUnitSegment],
    branchPoints: [
      ['0', '1'],
      ['0', '-1'],
    ],
    radius: '0.5',
    laws: [{ law: 'odd-symmetry', region: disc }],
    story: 'acsch z = asinh(1/z) (DLMF 4.37.7): cut [−i, i]; the reciprocal maps the outside of asinh’s cuts onto it.',
  },
];
