import { readFileSync } from 'node:fs';
import path from 'node:path';
import { suiteSchema } from '../../../shared/schemas/suite-schema';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import type { Target } from '../../../harness/adapters/target';
import type { TargetDescriptor } from '../../../harness/adapters/target-descriptor';
import { versionMatrix } from '../../../harness/matrix/version-matrix';
import { parseDouble } from '../../../harness/reference/numbers/parse-double';
import { referenceTarget } from '../support/reference-target';
import type { WireComplex } from '../../../shared/wire-complex';

const demo = (id: string) =>
  suiteSchema.parse(
    JSON.parse(readFileSync(path.join(__dirname, '..', '..', '..', 'suites', 'demo', `${id}.json`), 'utf8')),
  );
const complexJs = (...versions: string[]) =>
  versions.map((v) => {
    const d = discoverTargets().find((t) => t.name === `complex.js@${v}`);
    if (!d) throw new Error(`complex.js ${v} is installed with the project`);
    return d;
  });
const asVersion = (version: string, make: () => Target): TargetDescriptor => {
  const info = { ...make(), version };
  return {
    name: `${info.name}@${version}`,
    library: info.library,
    version,
    settings: {},
    open: () => ({ ...make(), version }),
  };
};
const num = (w: WireComplex | null): ComplexPair => [parseDouble(w!.re), parseDouble(w!.im)];

async function cmathValue(op: string, z: ComplexPair): Promise<ComplexPair> {
  const d = discoverTargets().find((t) => t.library === 'cmath');
  if (!d) throw new Error('Debian python3 at /usr/bin/python3 runs the cmath target');
  const target = d.open();
  try {
    const [answer] = await target.evaluate(op, [[z]]);
    if (!answer || 'error' in answer) throw new Error(`cmath ${op}: ${answer?.error}`);
    return answer.value;
  } finally {
    await target.close();
  }
}

describe('versionMatrix', () => {
  it('shows complex.js 2.4.1 dropping −0 at its constructor entry (no longer "no value changed"), per entry asked for', async () => {
    // Observed directly first: 2.4.1's constructor gives +0 for −0, 2.4.2's keeps it.
    const ctor = (alias: string) => require(alias) as new (re: number, im: number) => { im: number };
    expect(Object.is(new (ctor('complex.js-2.4.1'))(-4, -0).im, -0)).toBe(false);
    expect(Object.is(new (ctor('complex.js-2.4.2'))(-4, -0).im, -0)).toBe(true);
    const m = await versionMatrix(
      'complex.js',
      [demo('log-through-the-constructor-keeps-minus-zero')],
      complexJs('2.3.0', '2.4.1', '2.4.2'),
      ['complex', 'string'],
    );
    expect(m.suites.map((s) => s.entry)).toEqual(['complex', 'string']);
    const [atConstructor, atString] = m.suites;
    expect(atConstructor!.statusByVersion.map((v) => [v.version, v.fail])).toEqual([
      ['2.3.0', 0],
      ['2.4.1', 10],
      ['2.4.2', 0],
    ]);
    // Below the cut: log(x − 0i) = ln|x| − πi (ISO/IEC 9899:2011 G.6.3.2, clog(conj z) = conj(clog z)); 2.4.1 gives + πi.
    const below = atConstructor!.changes.filter((c) => c.path.startsWith('just below'));
    expect(below).toHaveLength(8);
    for (const c of below) {
      expect(c.firstChangedIn).toBe('2.4.1');
      expect(c.steps[0]!.after.outcome).toEqual({
        kind: 'fail',
        diagnosis: { kind: 'zero-sign', part: 'im', of: 'input' },
      });
      expect(Math.sign(parseDouble(c.steps[0]!.after.value!.im))).toBe(1);
    }
    expect(atConstructor!.changes.filter((c) => c.path.startsWith('just above'))).toEqual([]);
    // The straddle's two points exactly on the cut with −0 are the other two of the ten.
    expect(atConstructor!.changes.filter((c) => c.path === 'across the cut').map((c) => c.label)).toEqual([
      'on -0',
      'on -0',
    ]);
    // complex.js's string parser loses −0 in every version here: failing throughout, and so no change.
    expect(atString!.statusByVersion.map((v) => v.fail)).toEqual([10, 10, 10]);
    expect(atString!.changes).toEqual([]);
  });

  it('finds that complex.js 2.4.1 put atan(+0 + 2i) on the left of its cut and 2.4.2 put it back, with the diagnosis on each side', async () => {
    const m = await versionMatrix('complex.js', [demo('atan-principal-sz')], complexJs('2.3.0', '2.4.1', '2.4.2'));
    const change = m.suites[0]!.changes.find((c) => c.z.re === '0' && c.z.im === '2' && c.label === 'on +0');
    expect(change?.firstChangedIn).toBe('2.4.1');
    const [worse, better] = change!.steps;
    expect([worse!.before.version, worse!.before.outcome, worse!.after.version, worse!.after.outcome]).toEqual([
      '2.3.0',
      { kind: 'pass' },
      '2.4.1',
      { kind: 'fail', diagnosis: { kind: 'zero-sign', part: 're', of: 'input' } },
    ]);
    expect([better!.after.version, better!.after.outcome]).toEqual(['2.4.2', { kind: 'pass' }]);
    // Python's cmath (Annex G, G.6.2.3 via catanh and G.6 paragraph 7): catan(+0 + 2i) = π/2 + 0.549…i, the value 2.3.0 and 2.4.2 give.
    const cmath = await cmathValue('atan', [0, 2]);
    const [before, after] = [num(worse!.before.value), num(worse!.after.value)];
    expect(before[0]).toBe(cmath[0]);
    expect(before[1]).toBeCloseTo(cmath[1], 15); // complex.js and cmath differ by 1 ulp in the imaginary part
    expect(after[0]).toBe(-cmath[0]);
  }, 20_000);

  it('finds that complex.js 2.4.1 gives log(1 - 0i) a +0 imaginary part where 2.3.0 kept -0, as cmath does', async () => {
    const m = await versionMatrix('complex.js', [demo('log-principal-sz')], complexJs('2.3.0', '2.4.1'));
    const change = m.suites[0]!.changes.find((c) => c.z.re === '1' && c.z.im === '-0');
    expect(change?.steps[0]?.before.value).toEqual({ re: '0', im: '-0' });
    expect(change?.steps[0]?.after.value).toEqual({ re: '0', im: '0' });
    expect(change?.steps[0]?.after.outcome).toMatchObject({ kind: 'fail', diagnosis: { kind: 'zero-sign' } });
    // ISO/IEC 9899:2011 G.6.3.2 via conjugate symmetry: clog(1 − 0i) = 0 − 0i; Python's cmath agrees.
    expect(Object.is((await cmathValue('log', [1, -0]))[1], -0)).toBe(true);
  }, 20_000);

  it('reports exactly the points where a later "version" differs: a sqrt that starts ignoring zero signs changes only at inputs with a -0 imaginary part', async () => {
    const ignoring = () =>
      referenceTarget('signed-zero', { sqrt: ([z], ref) => ref('sqrt', [[z![0] || 0, z![1] || 0]]) });
    const m = await versionMatrix(
      'reference',
      [demo('sqrt-principal-sz')],
      [asVersion('1', () => referenceTarget('signed-zero')), asVersion('2', ignoring)],
    );
    const changes = m.suites[0]!.changes;
    expect(changes.length).toBeGreaterThan(0);
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj z) = conj csqrt(z), so at x − 0i the mutant gives the conjugate of the right value
    // (±i√|x| swapped for x < 0, a zero sign for x > 0), and nothing else may change.
    expect(changes.every((c) => c.z.im === '-0')).toBe(true);
    expect(
      changes.every((c) => {
        const [b, a] = [num(c.steps[0]!.before.value), num(c.steps[0]!.after.value)];
        return Object.is(a[0], b[0]) && Object.is(a[1], -b[1]);
      }),
    ).toBe(true);
    expect(changes.some((c) => parseDouble(c.z.re) < 0) && changes.some((c) => parseDouble(c.z.re) > 0)).toBe(true);
    expect(
      changes.every(
        (c) =>
          c.firstChangedIn === '2' &&
          c.steps[0]!.before.outcome.kind === 'pass' &&
          c.steps[0]!.after.outcome.kind === 'fail',
      ),
    ).toBe(true);
    expect(m.suites[0]!.statusByVersion.map((s) => s.status)).toEqual(['pass', 'fail']);
  });

  it('reports no change between two installs of the same version and says what that does not show', async () => {
    const [d] = complexJs('2.4.3');
    const m = await versionMatrix('complex.js', [demo('sqrt-principal-sz')], [d!, d!]);
    expect(m.suites[0]!.changes).toEqual([]);
    expect(m.statement).toContain('not the same library');
  });
});
