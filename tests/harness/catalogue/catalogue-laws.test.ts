import { CATALOGUE_ENTRIES } from '../../../harness/catalogue/catalogue-entries';
import type { FunctionEntry } from '../../../harness/catalogue/function-entry';
import type { ComplexDouble } from '../../../harness/checks/complex-double';
import { otherSheets } from '../../../harness/checks/other-sheets';
import type { SheetFamily } from '../../../harness/checks/sheet-family';
import { principalDouble } from '../../../harness/reference/principal-double';
import { FUNCTION_ARITY } from '../../../shared/function-arity';
import type { Convention } from '../../../shared/schemas/convention-schema';

/** A grid over |Re|, |Im| ≤ 3 with both zeros, so every cut, branch point and axis is crossed and sat on. */
const AXIS = [-3, -1.5, -1, -0.5, -0, 0, 0.25, 0.5, 1, 1.5, 3];
const GRID: ComplexDouble[] = AXIS.flatMap((x) => AXIS.map((y): ComplexDouble => [x, y]));

const mul = (a: ComplexDouble, b: ComplexDouble): ComplexDouble => [
  a[0] * b[0] - a[1] * b[1],
  a[0] * b[1] + a[1] * b[0],
];
const div = (a: ComplexDouble, b: ComplexDouble): ComplexDouble => {
  const d = b[0] * b[0] + b[1] * b[1];
  return [(a[0] * b[0] + a[1] * b[1]) / d, (a[1] * b[0] - a[0] * b[1]) / d];
};
const sin = ([a, b]: ComplexDouble): ComplexDouble => [Math.sin(a) * Math.cosh(b), Math.cos(a) * Math.sinh(b)];
const cos = ([a, b]: ComplexDouble): ComplexDouble => [Math.cos(a) * Math.cosh(b), -Math.sin(a) * Math.sinh(b)];
const sinh = ([a, b]: ComplexDouble): ComplexDouble => [Math.sinh(a) * Math.cos(b), Math.cosh(a) * Math.sin(b)];
const cosh = ([a, b]: ComplexDouble): ComplexDouble => [Math.cosh(a) * Math.cos(b), Math.sinh(a) * Math.sin(b)];

/** The single-valued function each additive family inverts (DLMF 4.2.19, 4.14, 4.28). */
const FORWARD: Record<Exclude<SheetFamily['kind'], 'power'>, (w: ComplexDouble) => ComplexDouble> = {
  log: ([a, b]) => [Math.exp(a) * Math.cos(b), Math.exp(a) * Math.sin(b)],
  asin: sin,
  acos: cos,
  atan: (w) => div(sin(w), cos(w)),
  asinh: sinh,
  acosh: cosh,
  atanh: (w) => div(sinh(w), cosh(w)),
};

const finite = (v: ComplexDouble): boolean => Number.isFinite(v[0]) && Number.isFinite(v[1]);
const close = (a: ComplexDouble, b: ComplexDouble): boolean =>
  Math.hypot(a[0] - b[0], a[1] - b[1]) <= 1e-9 * Math.max(1, Math.hypot(b[0], b[1]));

const single = (kind: FunctionEntry['sheets']['kind']) =>
  CATALOGUE_ENTRIES.filter((e) => FUNCTION_ARITY[e.name] === 1 && e.sheets.kind === kind);

describe('the laws each catalogue entry states about its function', () => {
  it.each(
    CATALOGUE_ENTRIES.filter((e) => e.range).flatMap((e) =>
      (['signed-zero', 'counter-clockwise'] as Convention[]).map((c) => [e.name, c, e] as const),
    ),
  )(
    "%s under %s: the reference engine's values on a grid lie in the entry's principal range",
    (name, convention, entry) => {
      for (const [x, y] of GRID) {
        const v = principalDouble(name, x, y, convention);
        if (!finite(v)) continue;
        for (const c of entry.range!) {
          const part = c.part === 're' ? v[0] : c.part === 'im' ? v[1] : Math.atan2(v[1], v[0]);
          const where = { fn: name, z: [x, y], v, part: c.part };
          expect({ ...where, inside: part >= c.min && part <= c.max }).toEqual({ ...where, inside: true });
          // Kahan's rule closes the cut from above, so the lower edge of a half-open range is never reached.
          if (convention === 'counter-clockwise' && c.ccwOpenMin)
            expect({ ...where, part }).not.toEqual({ ...where, part: c.min });
        }
      }
    },
  );

  it.each(single('additive').map((e) => [e.name, e] as const))(
    "%s: every value of the entry's sheet family maps back to z",
    (name, entry) => {
      if (entry.sheets.kind !== 'additive') throw new Error('filtered to additive families');
      const family: SheetFamily = { kind: entry.sheets.family, ks: [-2, -1, 1, 2], sign: 1 };
      const forward = FORWARD[entry.sheets.family];
      // A reciprocal function g(1/z) is inverted by 1/forward (DLMF 4.23.7–9, 4.37.7–9).
      const back = entry.reference.kind === 'reciprocal' ? (w: ComplexDouble) => div([1, 0], forward(w)) : forward;
      for (const z of GRID.filter(([x, y]) => Math.abs(x) + Math.abs(y) > 0.3)) {
        const v = principalDouble(name, z[0], z[1], 'signed-zero');
        if (!finite(v) || !close(back(v), z)) continue; // near a pole the double v cannot map back closely
        for (const { k, value } of otherSheets(family, v)) {
          const at = { fn: name, z, k };
          expect({ ...at, back: close(back(value), z) }).toEqual({ ...at, back: true });
          // Off the axes (where every branch point lies) each sheet's value differs from the principal one.
          if (z[0] !== 0 && z[1] !== 0) expect({ ...at, other: !close(value, v) }).toEqual({ ...at, other: true });
        }
      }
    },
  );

  it.each(single('root').map((e) => [e.name, e] as const))(
    "%s: every value of the entry's root family raised to the degree gives z",
    (name, entry) => {
      if (entry.sheets.kind !== 'root') throw new Error('filtered to roots');
      const q = entry.sheets.degree;
      const family: SheetFamily = { kind: 'power', nu: [1 / q, 0], ks: [1, 2].filter((k) => k < q), sign: 1 };
      for (const z of GRID.filter(([x, y]) => Math.abs(x) + Math.abs(y) > 0)) {
        const v = principalDouble(name, z[0], z[1], 'signed-zero');
        for (const { k, value } of otherSheets(family, v)) {
          let p: ComplexDouble = [1, 0];
          for (let i = 0; i < q; i++) p = mul(p, value);
          expect({ fn: name, z, k, power: close(p, z), other: !close(value, v) }).toEqual({
            fn: name,
            z,
            k,
            power: true,
            other: true,
          });
        }
      }
    },
  );
});
