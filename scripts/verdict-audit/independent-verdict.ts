import type { Tolerance } from '../../shared/schemas/tolerance-schema';

/** One sampled point of the verdict audit: what mpmath needs, the library's value and the harness's verdict. */
export interface AuditPoint {
  suite?: string;
  path?: string;
  index?: number;
  fn: string;
  w?: string | [string, string];
  n?: number;
  cuts: { axis: 'real' | 'imaginary'; from: string; to: string }[];
  inner: { fn: string; cuts: { axis: 'real' | 'imaginary'; from: string; to: string }[] } | null;
  convention: 'signed-zero' | 'counter-clockwise';
  /** Whether a zero part must carry the reference's sign (signed-zero principal suites). */
  zeroSigns?: boolean;
  /** For a regular-branch suite: g(z)^ν continued from z0 (independent_values.py). */
  regular?: {
    g: string;
    nu: [string, string];
    z0: [string, string];
    f0?: [string, string];
    k?: number;
    cuts: { points: [string, string][]; to_infinity: boolean }[];
  };
  tolerance?: Tolerance;
  z: [string, string];
  actual?: [string, string];
  harness?: 'pass' | 'fail';
  labels?: string[];
}

/** mpmath's value, correctly rounded, as C99 hex floats, or why it was not computed. */
export type IndependentValue = { re: string; im: string } | { unchecked: string };

const SPECIAL: Readonly<Record<string, number>> = {
  inf: Infinity,
  '+inf': Infinity,
  '-inf': -Infinity,
  infinity: Infinity,
  '-infinity': -Infinity,
  nan: NaN,
};

const fromHex = (text: string): number => {
  const special = SPECIAL[text.trim().toLowerCase()];
  if (special !== undefined) return special;
  const m = /^(-?)0x([01])\.?([0-9a-f]*)p([+-]\d+)$/i.exec(text.trim());
  if (!m) return Number(text);
  const [, sign, lead, frac, exp] = m as unknown as [string, string, string, string, string];
  const mantissa = Number(lead) + (frac ? parseInt(frac, 16) / 16 ** frac.length : 0);
  const v = mantissa * 2 ** Number(exp);
  return sign ? -v : v;
};

/** Doubles between a and b by their bit patterns (BigInt), ±0 equal; written apart from the harness's own count. */
function ulpsBetween(a: number, b: number): number {
  const key = (x: number): bigint => {
    const v = new DataView(new ArrayBuffer(8));
    v.setFloat64(0, x);
    const bits = v.getBigInt64(0);
    return bits < 0n ? -(bits & 0x7fffffffffffffffn) : bits;
  };
  const d = key(a) - key(b);
  return Number(d < 0n ? -d : d);
}

/**
 * The library's value judged again against mpmath's, with the suite's tolerance and convention,
 * by code written apart from the harness: NaN only against NaN, an infinity only against the
 * same one; where zero signs count (`zeroSigns`, by default under the signed-zero convention) a
 * zero part must carry mpmath's limit sign; then ulps per part
 * (`ulps`) or the normwise relative error |a − e| / |e| (`relative`), or either when both are given,
 * the relative one then only where no non-zero part has the opposite sign to mpmath's.
 */
export function independentVerdict(p: AuditPoint, mpmath: IndependentValue): 'pass' | 'fail' | 'unchecked' {
  if ('unchecked' in mpmath || !p.actual || !p.tolerance) return 'unchecked';
  const a = p.actual.map(fromHex) as [number, number];
  const e = [fromHex(mpmath.re), fromHex(mpmath.im)] as [number, number];
  for (let k = 0; k < 2; k++) {
    const [x, y] = [a[k] as number, e[k] as number];
    if (Number.isNaN(y) || !Number.isFinite(y)) {
      if (!Object.is(x, y)) return 'fail';
    } else if (!Number.isFinite(x)) return 'fail';
    if ((p.zeroSigns ?? p.convention === 'signed-zero') && x === 0 && y === 0 && Object.is(x, -0) !== Object.is(y, -0))
      return 'fail';
  }
  const tol = p.tolerance as { ulps?: number; relative?: number };
  const ulps = Math.max(ulpsBetween(a[0], e[0]), ulpsBetween(a[1], e[1]));
  const size = Math.hypot(e[0], e[1]);
  const relative = size === 0 ? Math.hypot(a[0] - e[0], a[1] - e[1]) : Math.hypot(a[0] - e[0], a[1] - e[1]) / size;
  const byUlps = tol.ulps !== undefined && ulps <= tol.ulps;
  // With both bounds, the relative one does not forgive a non-zero part whose sign is opposite
  // to mpmath's (docs/suite-format.md "Tolerances").
  const flipped = [0, 1].some((k) => (a[k] as number) * Math.sign(e[k] as number) < 0);
  const byRelative = tol.relative !== undefined && relative <= tol.relative && !(tol.ulps !== undefined && flipped);
  return byUlps || byRelative ? 'pass' : 'fail';
}
