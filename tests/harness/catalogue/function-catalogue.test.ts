import { all, create } from 'mathjs';
import { OP_ARITY } from '../../../harness/adapters/op-arity';
import { CATALOGUE_ENTRIES } from '../../../harness/catalogue/catalogue-entries';
import { catalogueEntry } from '../../../harness/catalogue/catalogue-entry';
import { FUNCTION_CATALOGUE } from '../../../harness/catalogue/function-catalogue';
import { FUNCTION_RULES } from '../../../harness/checks/function-rules';
import { catalogueCuts } from '../../../harness/cuts/catalogue-cuts';
import { parseSubject } from '../../../harness/expressions/parse-subject';
import { FINGERPRINT_FUNCTIONS } from '../../../harness/fingerprint/fingerprint-functions';
import { PRINCIPAL_RANGE } from '../../../harness/properties/principal-range';
import { catalogue } from '../../../harness/reference/catalogue';
import { DEMO_PRINCIPAL_FUNCTIONS } from '../../../scripts/demo-catalogue/demo-principal-functions';
import { FUNCTION_ARITY } from '../../../shared/function-arity';
import { FUNCTION_NAMES } from '../../../shared/function-names';

const math = create(all!);

/** Every function name mathjs's parser knows, the catalogue's, and names an object inherits. */
const CANDIDATE_NAMES = [
  ...FUNCTION_NAMES,
  ...Object.keys(math).filter((k) => /^[a-z][A-Za-z0-9]*$/.test(k) && typeof (math as never)[k] === 'function'),
  'toString',
  'constructor',
  'hasOwnProperty',
  'valueOf',
];

const parses = (text: string): boolean => {
  try {
    parseSubject(text);
    return true;
  } catch {
    return false;
  }
};

/** An axis cut as the interval it covers on its axis, merged with those it touches, for comparing sets of cuts. */
type AxisInterval = { axis: 're' | 'im'; from: number; to: number };

function merged(intervals: AxisInterval[]): AxisInterval[] {
  const sorted = [...intervals].sort((a, b) => (a.axis === b.axis ? a.from - b.from : a.axis < b.axis ? -1 : 1));
  const out: AxisInterval[] = [];
  for (const i of sorted) {
    const last = out[out.length - 1];
    if (last && last.axis === i.axis && i.from <= last.to) last.to = Math.max(last.to, i.to);
    else out.push({ ...i });
  }
  return out;
}

function interval(from: [number, number], to: [number, number], toInfinity: boolean): AxisInterval {
  const axis = from[1] === 0 && to[1] === 0 ? 're' : 'im';
  const [a, b] = axis === 're' ? [from[0], to[0]] : [from[1], to[1]];
  const end = toInfinity ? (b > a ? Infinity : -Infinity) : b;
  return { axis, from: Math.min(a, end), to: Math.max(a, end) };
}

describe('the function catalogue', () => {
  it('has one entry per name of shared/function-arity.ts, in the same order, each under its own name', () => {
    expect(Object.keys(FUNCTION_CATALOGUE)).toEqual([...FUNCTION_NAMES]);
    for (const [key, entry] of Object.entries(FUNCTION_CATALOGUE)) {
      expect(entry.name).toBe(key);
      if (entry.reference.kind !== 'power') expect(entry.reference.fn.name).toBe(key);
    }
    expect(CATALOGUE_ENTRIES.map((e) => e.name)).toEqual([...FUNCTION_NAMES]);
  });

  it.each(CATALOGUE_ENTRIES.map((e) => [e.name, e] as const))(
    '%s states its rule with the published source of each part',
    (_name, entry) => {
      expect(entry.rule.definition).toMatch(/^DLMF (4\.\d+\.\d+|§4\.\d+\([iv]+\))/);
      expect(entry.rule.annexG).toMatch(/ISO\/IEC 9899:2011 G\.6/);
      if ((catalogueCuts(entry.name) ?? []).length === 0) expect(entry.rule.counterClockwise).toBe('no cut');
      else expect(entry.rule.counterClockwise).toMatch(/Kahan 1987/);
    },
  );

  it('gives a principal range to exactly the functions with a fixed one (not powers, roots by exponent, or exp)', () => {
    for (const entry of CATALOGUE_ENTRIES) {
      const fixed = entry.reference.kind !== 'power' && entry.sheets.kind !== 'none';
      expect({ fn: entry.name, hasRange: entry.range !== null }).toEqual({ fn: entry.name, hasRange: fixed });
      for (const c of entry.range ?? []) expect(c.min).toBeLessThan(c.max);
    }
  });

  it('takes two arguments exactly for the powers whose exponent is an argument (pow, nthroot)', () => {
    for (const entry of CATALOGUE_ENTRIES) {
      expect({ fn: entry.name, arity: FUNCTION_ARITY[entry.name] }).toEqual({
        fn: entry.name,
        arity: entry.sheets.kind === 'exponent' ? 2 : 1,
      });
    }
  });

  it('has the fingerprint call every function with a cut and none without, under unique labels', () => {
    for (const entry of CATALOGUE_ENTRIES) {
      const hasCut = (catalogueCuts(entry.name) ?? []).length > 0;
      // pow is called from the roots' entries, as pow(z, 1/2) and pow(z, 1/3).
      const called = FINGERPRINT_FUNCTIONS.some((f) => f.op === entry.name);
      expect({ fn: entry.name, called }).toEqual({ fn: entry.name, called: hasCut });
      for (const probe of entry.fingerprint) {
        expect(FUNCTION_NAMES).toContain(probe.op);
        expect(probe.extra).toHaveLength(OP_ARITY[probe.op]! - 1);
      }
    }
    const labels = FINGERPRINT_FUNCTIONS.map((f) => f.label);
    expect(new Set(labels).size).toBe(labels.length);
  });

  it('gives every function a demo suite whose subject calls it, under a unique slug', () => {
    for (const entry of CATALOGUE_ENTRIES) {
      expect(entry.demo.length).toBeGreaterThan(0);
      for (const demo of entry.demo) {
        const expr = parseSubject(demo.subject);
        const outer = expr.kind === 'call' ? expr.fn : expr.kind;
        const expected = { pow: ['power', 'complexPower'], nthroot: ['nthroot'] }[entry.name as string] ?? [entry.name];
        expect(expected).toContain(outer);
      }
    }
    const slugs = DEMO_PRINCIPAL_FUNCTIONS.map((d) => d.slug);
    expect(new Set(slugs).size).toBe(slugs.length);
  });

  it("draws each demo suite's cuts over exactly the points of the reference engine's cuts", () => {
    for (const entry of CATALOGUE_ENTRIES) {
      const reference = merged((catalogueCuts(entry.name) ?? []).map((c) => interval(c.from, c.to, c.toInfinity)));
      for (const demo of entry.demo) {
        const drawn = merged(
          demo.cuts.map((c) =>
            c.kind === 'ray'
              ? interval([Number(c.from[0]), Number(c.from[1])], [Number(c.through[0]), Number(c.through[1])], true)
              : interval([Number(c.from[0]), Number(c.from[1])], [Number(c.to[0]), Number(c.to[1])], false),
          ),
        );
        expect({ slug: demo.slug, cuts: drawn }).toEqual({ slug: demo.slug, cuts: reference });
      }
    }
  });

  it('lets the subject parser call exactly the catalogue functions, each with its arity', () => {
    const accepted = CANDIDATE_NAMES.filter((name) => parses(`${name}(z)`) || parses(`${name}(z, 2)`));
    expect(new Set(accepted)).toEqual(new Set(FUNCTION_NAMES));
    for (const entry of CATALOGUE_ENTRIES) {
      const args = FUNCTION_ARITY[entry.name] === 1 ? 'z' : 'z, 2';
      expect({ fn: entry.name, parses: parses(`${entry.name}(${args})`) }).toEqual({ fn: entry.name, parses: true });
    }
  });

  it('computes the tables keyed by name from the entries, and knows no other name', () => {
    for (const entry of CATALOGUE_ENTRIES) {
      expect(catalogue[entry.name]).toBe(entry.reference);
      expect(FUNCTION_RULES[entry.name]).toBe(entry.rule);
      expect(OP_ARITY[entry.name]).toBe(FUNCTION_ARITY[entry.name]);
      expect(PRINCIPAL_RANGE[entry.name] ?? null).toBe(entry.range);
      expect(catalogueEntry(entry.name)).toBe(entry);
    }
    for (const name of ['sin', 'toString', 'constructor', '__proto__']) {
      expect(catalogueEntry(name)).toBeUndefined();
      expect(catalogueCuts(name)).toBeNull();
    }
  });
});
