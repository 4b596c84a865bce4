import { Decimal } from 'decimal.js';
import { BigComplex } from '../../harness/reference/complex/big-complex';
import { formatDouble } from '../../harness/reference/numbers/format-double';
import { parseNumber } from '../../harness/reference/numbers/parse-number';
import { principalDouble } from '../../harness/reference/principal-double';
import { principalValue, type PrincipalRequest } from '../../harness/reference/principal-value';
import { askPython, type OraclePoint } from './python-oracle';
import { unhex } from './unhex';
import { sameDouble } from './same-double';
import { seededRandom } from './seeded-random';

// mpmath, 60 digits (evaluated at 720 so tiny parts keep their digits; Debian python3-mpmath with gmpy2, /usr/bin/python3): every point of every
// function of the catalogue, off the axes so that no zero sign is involved (cmath covers those).
// Agreement: each part to 38 significant digits, and the double sign-exactly equal to mpmath's
// 60-digit value rounded to nearest — from the bigint engine and from principalDouble (double-double tier).

const SEED = 20261201;
const DIGITS = 38;

interface Spec {
  fn: string;
  w?: [string, string] | string;
  n?: number;
  /** Branch points, and cut directions as [start, step] (a point and a unit direction along the cut). */
  branchPoints: [number, number][];
  cuts: { at: [number, number]; across: [number, number] }[];
  big: boolean;
}

const REAL_CUTS_PM1 = [
  { at: [2, 0] as [number, number], across: [0, 1] as [number, number] },
  { at: [-3.5, 0] as [number, number], across: [0, 1] as [number, number] },
  { at: [1e6, 0] as [number, number], across: [0, 1] as [number, number] },
];
const IMAG_CUTS_PM1 = [
  { at: [0, 2] as [number, number], across: [1, 0] as [number, number] },
  { at: [0, -3.5] as [number, number], across: [1, 0] as [number, number] },
  { at: [0, 1e6] as [number, number], across: [1, 0] as [number, number] },
];
const NEGATIVE_AXIS = [
  { at: [-2, 0] as [number, number], across: [0, 1] as [number, number] },
  { at: [-0.25, 0] as [number, number], across: [0, 1] as [number, number] },
  { at: [-1e6, 0] as [number, number], across: [0, 1] as [number, number] },
];
const UNIT_REAL_SEGMENT = [
  { at: [0.5, 0] as [number, number], across: [0, 1] as [number, number] },
  { at: [-0.75, 0] as [number, number], across: [0, 1] as [number, number] },
];
const UNIT_IMAG_SEGMENT = [
  { at: [0, 0.5] as [number, number], across: [1, 0] as [number, number] },
  { at: [0, -0.75] as [number, number], across: [1, 0] as [number, number] },
];

const SPECS: Spec[] = [
  { fn: 'sqrt', branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: true },
  { fn: 'cbrt', branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: true },
  { fn: 'nthroot', n: 5, branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: true },
  { fn: 'pow', w: '2/5', branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: true },
  { fn: 'pow', w: '-7/3', branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: true },
  { fn: 'pow', w: ['0.3', '-1.7'], branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: false },
  { fn: 'exp', branchPoints: [], cuts: [], big: false },
  { fn: 'log', branchPoints: [[0, 0]], cuts: NEGATIVE_AXIS, big: true },
  {
    fn: 'asin',
    branchPoints: [
      [1, 0],
      [-1, 0],
    ],
    cuts: REAL_CUTS_PM1,
    big: true,
  },
  {
    fn: 'acos',
    branchPoints: [
      [1, 0],
      [-1, 0],
    ],
    cuts: REAL_CUTS_PM1,
    big: true,
  },
  {
    fn: 'atan',
    branchPoints: [
      [0, 1],
      [0, -1],
    ],
    cuts: IMAG_CUTS_PM1,
    big: true,
  },
  {
    fn: 'asinh',
    branchPoints: [
      [0, 1],
      [0, -1],
    ],
    cuts: IMAG_CUTS_PM1,
    big: true,
  },
  {
    fn: 'acosh',
    branchPoints: [
      [1, 0],
      [-1, 0],
    ],
    cuts: [...NEGATIVE_AXIS, { at: [0.5, 0], across: [0, 1] }],
    big: true,
  },
  {
    fn: 'atanh',
    branchPoints: [
      [1, 0],
      [-1, 0],
    ],
    cuts: REAL_CUTS_PM1,
    big: true,
  },
  {
    fn: 'acot',
    branchPoints: [
      [0, 1],
      [0, -1],
    ],
    cuts: UNIT_IMAG_SEGMENT,
    big: true,
  },
  {
    fn: 'asec',
    branchPoints: [
      [1, 0],
      [-1, 0],
      [0, 0],
    ],
    cuts: UNIT_REAL_SEGMENT,
    big: true,
  },
  {
    fn: 'acsc',
    branchPoints: [
      [1, 0],
      [-1, 0],
      [0, 0],
    ],
    cuts: UNIT_REAL_SEGMENT,
    big: true,
  },
  {
    fn: 'acoth',
    branchPoints: [
      [1, 0],
      [-1, 0],
    ],
    cuts: UNIT_REAL_SEGMENT,
    big: true,
  },
  {
    fn: 'asech',
    branchPoints: [
      [1, 0],
      [-1, 0],
      [0, 0],
    ],
    cuts: [
      { at: [-2, 0], across: [0, 1] },
      { at: [3, 0], across: [0, 1] },
    ],
    big: true,
  },
  {
    fn: 'acsch',
    branchPoints: [
      [0, 1],
      [0, -1],
    ],
    cuts: UNIT_IMAG_SEGMENT,
    big: true,
  },
];

function label(spec: Spec): string {
  if (spec.fn === 'pow') return `pow(z, ${Array.isArray(spec.w) ? `${spec.w[0]}${spec.w[1]}i` : spec.w})`;
  if (spec.fn === 'nthroot') return `nthroot(z, ${spec.n})`;
  return spec.fn;
}

/** The seeded point set of one function: a box, both sides of each cut at 1e−15 and 1e−300, near branch points, 1e±300. */
function pointsFor(spec: Spec, random: () => number): [number, number][] {
  const pts: [number, number][] = [];
  const offAxis = (v: number) => (v === 0 ? 0.125 : v);
  for (let i = 0; i < 20; i++) pts.push([offAxis((random() - 0.5) * 8), offAxis((random() - 0.5) * 8)]);
  for (let i = 0; i < 4; i++) pts.push([offAxis((random() - 0.5) * 1400), offAxis((random() - 0.5) * 2e15)]);
  for (const cut of spec.cuts) {
    for (const offset of [1e-15, 1e-300]) {
      for (const side of [1, -1]) {
        const x = cut.at[0] + side * offset * cut.across[0];
        const y = cut.at[1] + side * offset * cut.across[1];
        pts.push([x === 0 ? side * offset : x, y === 0 ? side * offset : y]);
      }
    }
  }
  for (const [bx, by] of spec.branchPoints) {
    for (const r of [1e-3, 1e-9]) {
      const t = random() * 2 * Math.PI;
      const x = bx + r * Math.cos(t);
      const y = by + r * Math.sin(t);
      if (x !== 0 && y !== 0) pts.push([x, y]);
    }
  }
  if (spec.big) {
    for (const scale of [1e300, 1e-300]) {
      pts.push([scale * (0.5 + random()), scale * (random() - 1.5)]);
      pts.push([-scale * (0.5 + random()), scale * (0.5 + random())]);
    }
  }
  return pts;
}

function request(spec: Spec, x: number, y: number): PrincipalRequest {
  const z = BigComplex.fromDoubles(x, y);
  let w: PrincipalRequest['w'];
  if (typeof spec.w === 'string') {
    const parsed = parseNumber(spec.w);
    if (parsed.kind !== 'exact') throw new Error('bad exponent');
    w = { kind: 'rational', value: parsed.value };
  } else if (spec.w) {
    w = { kind: 'complex', value: BigComplex.fromDoubles(Number(spec.w[0]), Number(spec.w[1])) };
  }
  return { fn: spec.fn, z, w, n: spec.n, convention: 'signed-zero' };
}

function agrees(ours: string, theirs: string): boolean {
  const a = new Decimal(ours);
  const b = new Decimal(theirs);
  if (b.isZero()) return a.isZero();
  return a
    .minus(b)
    .abs()
    .lte(b.abs().times(new Decimal(10).pow(-DIGITS)));
}

interface MpAnswer {
  re: string;
  im: string;
  re_double: string;
  im_double: string;
}

describe('principal values against mpmath at 60 digits', () => {
  const random = seededRandom(SEED);
  const cases: { spec: Spec; x: number; y: number }[] = [];
  for (const spec of SPECS) for (const [x, y] of pointsFor(spec, random)) cases.push({ spec, x, y });
  const oracle: OraclePoint[] = cases.map(({ spec, x, y }) => ({
    fn: spec.fn,
    z: [formatDouble(x), formatDouble(y)],
    ...(spec.w !== undefined ? { w: spec.w } : {}),
    ...(spec.n !== undefined ? { n: spec.n } : {}),
  }));
  const answers = askPython<MpAnswer>('mpmath', oracle, 60);

  it('checks at least 600 seeded points', () => {
    expect(cases.length).toBeGreaterThanOrEqual(600);
  });

  it.each(SPECS.map((spec) => [label(spec), spec]))(
    'agrees with mpmath to 38 digits and sign-exact doubles for %s',
    (_, spec) => {
      const failures: string[] = [];
      let checked = 0;
      cases.forEach(({ spec: s, x, y }, i) => {
        if (s !== spec) return;
        checked++;
        const mp = answers[i] as MpAnswer;
        const r = principalValue(request(spec, x, y), { double: true, digits: 40 });
        const re = r.approximation.re.toDecimal(40);
        const im = r.approximation.im.toDecimal(40);
        const where = `${label(spec)} at ${formatDouble(x)} + ${formatDouble(y)}i`;
        if (!agrees(re, mp.re) || !agrees(im, mp.im))
          failures.push(`${where}: ours ${re} + ${im}i, mpmath ${mp.re} + ${mp.im}i`);
        if (!sameDouble(r.double[0], unhex(mp.re_double)) || !sameDouble(r.double[1], unhex(mp.im_double))) {
          failures.push(
            `${where}: double ${r.double.map(formatDouble).join(' + ')}i, mpmath rounds to ${mp.re_double} + ${mp.im_double}i`,
          );
        }
        if (spec.w === undefined && spec.n === undefined) {
          const fast = principalDouble(spec.fn, x, y, 'signed-zero');
          if (!sameDouble(fast[0], unhex(mp.re_double)) || !sameDouble(fast[1], unhex(mp.im_double))) {
            failures.push(
              `${where}: principalDouble ${fast.map(formatDouble).join(' + ')}i, mpmath rounds to ${mp.re_double} + ${mp.im_double}i`,
            );
          }
        }
      });
      expect(checked).toBeGreaterThanOrEqual(20);
      expect(failures).toEqual([]);
    },
  );
});
