import { CATALOGUE_ENTRIES } from '../../harness';
import { seededRandom } from '../../tests/external/seeded-random';

/** One request of the sweep, in the shape `sheetkeeper reference` reads (docs/suite-format.md). */
export interface SweepInput {
  fn: string;
  z: { re: string; im: string };
  w?: string | { re: string; im: string };
  n?: number;
  convention: 'signed-zero' | 'counter-clockwise';
  /** Which region of the input space the point was drawn from, for the report. */
  category: string;
}

const MAX = Number.MAX_VALUE;
const MIN_SUBNORMAL = Number.MIN_VALUE;
const scratch = new DataView(new ArrayBuffer(8));

/**
 * `count` seeded requests spread over every catalogue function, both conventions and the
 * whole binary64 range: random bit patterns (so every exponent from the subnormals to 2^1023
 * is as likely as any other), subnormals, values near the largest double, exact integers and
 * halves, points on every cut of the function with both zero signs, the branch points, and for
 * pow huge, tiny, rational (p/q, exact) and complex exponents. The same seed gives the same
 * requests; the jest slice and `npm run sweep:reference` both draw from here.
 */
export function sweepInputs(seed: number, count: number): SweepInput[] {
  const random = seededRandom(seed);
  const entries = CATALOGUE_ENTRIES;
  const out: SweepInput[] = [];
  for (let i = 0; i < count; i++) {
    const entry = entries[i % entries.length] as (typeof entries)[number];
    const cuts =
      entry.reference.kind === 'plain' || entry.reference.kind === 'reciprocal'
        ? entry.reference.fn.cuts
        : entry.reference.cuts;
    const [category, re, im] = drawZ(random, cuts);
    const input: SweepInput = {
      fn: entry.name,
      z: { re: wire(re), im: wire(im) },
      convention: random() < 0.5 ? 'signed-zero' : 'counter-clockwise',
      category,
    };
    if (entry.name === 'pow') {
      const [wCategory, w] = drawExponent(random, re === 0 && im === 0);
      input.w = w;
      input.category = `${category}, w ${wCategory}`;
    }
    if (entry.name === 'nthroot') input.n = pick(random, [2, 3, 4, 5, 7, 10, -2, -3, 64, 1000, -1001, 2147483647]);
    out.push(input);
  }
  return out;
}

type Draw = [string, number, number];

function drawZ(random: () => number, cuts: readonly { axis: string; from: number; to: number }[]): Draw {
  const u = random();
  if (u < 0.3) return ['bits', anyDouble(random), anyDouble(random)];
  if (u < 0.4) return ['subnormal', subnormal(random), random() < 0.5 ? subnormal(random) : anyDouble(random)];
  if (u < 0.5) return ['near-overflow', nearMax(random), random() < 0.5 ? nearMax(random) : anyDouble(random)];
  if (u < 0.6) return ['integers and halves', integerOrHalf(random), integerOrHalf(random)];
  if (u < 0.85 && cuts.length > 0) {
    const cut = pick(random, cuts);
    const t = onSegment(random, cut.from, cut.to);
    const zero = random() < 0.5 ? 0 : -0;
    return cut.axis === 'real' ? ['on a cut', t, zero] : ['on a cut', zero, t];
  }
  if (u < 0.95) {
    const t = withSign(
      random,
      pick(random, [anyDouble(random), integerOrHalf(random), subnormal(random), nearMax(random)]),
    );
    const zero = random() < 0.5 ? 0 : -0;
    return random() < 0.5 ? ['on an axis', t, zero] : ['on an axis', zero, t];
  }
  const [re, im] = pick(random, [
    [0, 0],
    [1, 0],
    [-1, 0],
    [0, 1],
    [0, -1],
    [2, 0],
    [0.5, 0],
  ] as [number, number][]);
  const flip = (x: number) => (random() < 0.5 ? x : -x);
  return ['branch and unit points', re === 0 ? flip(0) : re, im === 0 ? flip(0) : im];
}

/** A point of the cut [from, to]: an end, a random value inside it, or an integer or half inside it. */
function onSegment(random: () => number, from: number, to: number): number {
  const ends = [from, to].filter((x) => Number.isFinite(x));
  const u = random();
  if (u < 0.15 && ends.length > 0) return pick(random, ends);
  for (let tries = 0; tries < 20; tries++) {
    const t = withSign(random, u < 0.6 ? anyDouble(random) : u < 0.8 ? integerOrHalf(random) : nearMax(random));
    if (t >= from && t <= to) return t;
  }
  return Number.isFinite(from) ? (Number.isFinite(to) ? (from + to) / 2 : from * 2 || 1) : to * 2 || -1;
}

function drawExponent(random: () => number, zeroBase: boolean): [string, string | { re: string; im: string }] {
  const u = random();
  if (u < 0.25) {
    const q = 1 + Math.floor(random() * 12);
    const p = Math.floor(random() * 81) - 40;
    return ['p/q', `${p}/${q}`];
  }
  if (u < 0.35) return ['half', wire((Math.floor(random() * 81) - 40) / 2)];
  if (u < 0.5) {
    const huge = pick(random, [1e300, 2 ** 1023, MAX, 1025, 2049, 1e6 + 1, 123456789, 2 ** 60, 1e20]);
    return ['huge', wire(withSign(random, huge))];
  }
  if (u < 0.6) {
    const tiny = pick(random, [1e-300, MIN_SUBNORMAL, 2 ** -1022, 1e-20, subnormal(random)]);
    return ['tiny', wire(withSign(random, tiny))];
  }
  if (u < 0.85) {
    const part = () => withSign(random, random() * 8);
    const re = zeroBase ? Math.abs(part()) + 0.5 : part();
    return ['complex', { re: wire(re), im: wire(part()) }];
  }
  const q = 2 + Math.floor(random() * 10);
  const p = Math.floor(random() * 41) - 20 || 1;
  return ['complex p/q', { re: `${p}/${q}`, im: pick(random, ['1', '-1/3', '0', '5/7']) }];
}

/** A finite double from uniformly random bits: every exponent equally likely. */
function anyDouble(random: () => number): number {
  for (;;) {
    scratch.setUint32(0, (random() * 4294967296) >>> 0);
    scratch.setUint32(4, (random() * 4294967296) >>> 0);
    const x = scratch.getFloat64(0);
    if (Number.isFinite(x)) return x;
  }
}

function subnormal(random: () => number): number {
  scratch.setUint32(0, ((random() * 0x100000) >>> 0) | (random() < 0.5 ? 0x80000000 : 0));
  scratch.setUint32(4, (random() * 4294967296) >>> 0);
  return scratch.getFloat64(0) || MIN_SUBNORMAL;
}

/** |x| in [2^1020, MAX], the largest double itself one time in four. */
function nearMax(random: () => number): number {
  const x = random() < 0.25 ? MAX : MAX * (1 - random() * 0.9375);
  return withSign(random, x);
}

function integerOrHalf(random: () => number): number {
  const u = random();
  const k = u < 0.6 ? Math.floor(random() * 129) - 64 : Math.floor((random() - 0.5) * 2 ** 53);
  return u < 0.8 ? k + (random() < 0.5 ? 0.5 : 0) * (Math.abs(k) < 2 ** 52 ? 1 : 0) : k;
}

function withSign(random: () => number, x: number): number {
  return random() < 0.5 ? x : -x;
}

function pick<T>(random: () => number, items: readonly T[]): T {
  return items[Math.floor(random() * items.length)] as T;
}

function wire(x: number): string {
  return Object.is(x, -0) ? '-0' : String(x);
}
