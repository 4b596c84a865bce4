import { execFileSync } from 'node:child_process';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import type { EntryPointFinding } from '../../../harness/adapters/entry-point-finding';
import { probeEntryPoints } from '../../../harness/adapters/entry-point-probes';
import { PROBE_INPUTS } from '../../../harness/adapters/probe-inputs';
import { parseDouble } from '../../../harness/reference/numbers/parse-double';

type Value = { re: number; im: number };
type ComplexJs = new (...a: unknown[]) => Value;
type MathJs = {
  create(all: unknown, config: unknown): { complex(...a: unknown[]): Value; evaluate(s: string): unknown };
  all: unknown;
};

const descriptors = discoverTargets();
let findings: EntryPointFinding[];
beforeAll(async () => {
  findings = await probeEntryPoints(descriptors);
}, 60_000);

const finding = (target: string, way: string, input: [string, string]): EntryPointFinding => {
  const found = findings.find(
    (f) => f.target === target && f.way === way && f.input[0] === input[0] && f.input[1] === input[1],
  );
  if (!found) throw new Error(`no finding for ${target} ${way} ${input.join(' ')}`);
  return found;
};
const both = (v: Value, re: number, im: number): boolean => Object.is(v.re, re) && Object.is(v.im, im);

describe('probeEntryPoints', () => {
  it('reports every input for every way of every complex.js version, mathjs version and cmath', () => {
    const targets = new Set(findings.map((f) => f.target));
    for (const d of descriptors.filter((x) => x.library === 'complex.js')) expect(targets).toContain(d.name);
    for (const v of new Set(descriptors.filter((x) => x.library === 'mathjs').map((x) => x.version)))
      expect(targets).toContain(`mathjs@${v}`);
    expect([...targets].some((t) => t.startsWith('cmath@'))).toBe(true);
    const perWay = new Map<string, number>();
    for (const f of findings) perWay.set(`${f.target} ${f.way}`, (perWay.get(`${f.target} ${f.way}`) ?? 0) + 1);
    expect([...new Set(perWay.values())]).toEqual([PROBE_INPUTS.length]);
  });

  it('calls a finding intact exactly when both parts read back with the input value and zero sign', () => {
    for (const f of findings) {
      const same =
        f.arrived !== null &&
        f.arrived.every((part, k) => Object.is(parseDouble(part), parseDouble(f.input[k] as string)));
      expect(`${f.target} ${f.way} ${f.input.join(',')}: ${f.intact}`).toBe(
        `${f.target} ${f.way} ${f.input.join(',')}: ${same}`,
      );
    }
  });

  it.each(descriptors.filter((d) => d.library === 'complex.js').map((d) => [d.name, d] as const))(
    '%s: reports the constructor, object, array and string ways as the library independently behaves for 0 − 0i',
    (name, d) => {
      const mod = require(String(d.settings.package)) as ComplexJs & { default?: ComplexJs };
      const Complex = mod.default ?? mod;
      const observed: Record<string, boolean> = {
        'new Complex(re, im)': both(new Complex(0, -0), 0, -0),
        'new Complex({ re, im })': both(new Complex({ re: 0, im: -0 }), 0, -0),
        'new Complex([re, im])': both(new Complex([0, -0]), 0, -0),
        'new Complex("re±im i")': both(new Complex('0-0i'), 0, -0),
      };
      for (const [way, intact] of Object.entries(observed))
        expect(`${way}: ${finding(name, way, ['0', '-0']).intact}`).toBe(`${way}: ${intact}`);
    },
  );

  it('reports that complex.js 2.4.1 loses −0 in every way, where its constructor gives +0 for new Complex(0, −0)', () => {
    const Complex = require('complex.js-2.4.1') as ComplexJs;
    // Observed directly: this version's constructor does not keep −0.
    expect(Object.is(new Complex(0, -0).im, -0)).toBe(false);
    const ways = findings.filter((f) => f.target === 'complex.js@2.4.1' && f.input[1] === '-0');
    expect(ways.length).toBeGreaterThan(0);
    expect(ways.filter((f) => f.intact)).toEqual([]);
  });

  it.each([...new Set(descriptors.filter((d) => d.library === 'mathjs').map((d) => d.settings.package as string))])(
    '%s: reports math.complex with numbers, with a string and the expression parser as they independently behave for −0 − 0i',
    (alias) => {
      const d = descriptors.find((x) => x.settings.package === alias) as (typeof descriptors)[number];
      const mod = require(alias) as MathJs;
      const math = mod.create(mod.all, {});
      const observed: Record<string, boolean> = {
        'math.complex(re, im)': both(math.complex(-0, -0), -0, -0),
        'math.complex("re±im i")': both(math.complex('-0-0i'), -0, -0),
        'math.evaluate("re±im i")': both(math.evaluate('-0-0i') as Value, -0, -0),
      };
      for (const [way, intact] of Object.entries(observed)) {
        expect(`${way}: ${finding(`mathjs@${d.version}`, way, ['-0', '-0']).intact}`).toBe(`${way}: ${intact}`);
      }
    },
  );

  it('reports cmath as Python itself builds the numbers: the constructor and mixed arithmetic for 0 − 0i', () => {
    const target = findings.find((f) => f.target.startsWith('cmath@'))?.target as string;
    const out = execFileSync(
      '/usr/bin/python3',
      [
        '-c',
        'import math; a = complex(0.0, -0.0); b = 0.0 + -0.0 * 1j; print(math.copysign(1, a.imag), math.copysign(1, b.imag))',
      ],
      { encoding: 'utf8' },
    );
    const [constructorSign, mixedSign] = out.trim().split(' ').map(Number);
    expect(finding(target, 'constructor', ['0', '-0']).intact).toBe(constructorSign === -1);
    expect(finding(target, 'mixed-arithmetic', ['0', '-0']).intact).toBe(mixedSign === -1);
  });
});
