import { spawn } from 'node:child_process';
import path from 'node:path';
import type { CallResult } from '../../../harness/adapters/call-result';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { CMATH_ENTRIES } from '../../../harness/adapters/cmath-entries';
import type { StdioTarget } from '../../../harness/adapters/stdio-target';

const SCRIPT = path.join(__dirname, '..', '..', '..', 'harness', 'adapters', 'python', 'cmath_adapter.py');

function openCmath(): StdioTarget {
  const descriptor = discoverTargets().find((t) => t.library === 'cmath');
  if (!descriptor) throw new Error('no cmath target: /usr/bin/python3 does not run');
  return descriptor.open() as StdioTarget;
}

const value = (r: CallResult | undefined): ComplexPair => {
  if (!r || !('value' in r)) throw new Error(`expected a value, got ${JSON.stringify(r)}`);
  return r.value;
};

// Python's cmath follows ISO C Annex G for special values and signed zeros (its documentation
// says so, and raises ValueError or OverflowError where C returns a value: docs/conventions.md).
// The Annex G rules below were checked against the C99 text for G.6.2.2, G.6.2.3, G.6.3.1 and
// G.6.3.2; those for G.6.1.1, G.6.2.1 and G.6.4.2 only against manual pages that restate them
// (docs/sources.md). cmath agreeing with each of them is the cross-check.
describe('cmath through the stdio protocol', () => {
  let cmath: StdioTarget;
  beforeAll(() => {
    cmath = openCmath();
  });
  afterAll(async () => {
    await cmath.close();
  });

  it('names itself after the Python version /usr/bin/python3 reports', async () => {
    expect(cmath.name).toMatch(/^cmath@3\.\d+\.\d+$/);
    const answer = await cmath.request('describe', []);
    expect('reply' in answer && answer.reply.version).toBe(cmath.version);
  });

  it('lists in describe the entries the harness declares for it, complex(re, im) the default', async () => {
    const answer = await cmath.request('describe', []);
    if (!('reply' in answer)) throw new Error(answer.error);
    expect(answer.reply.entries).toEqual(CMATH_ENTRIES);
    expect(cmath.entries).toEqual(CMATH_ENTRIES);
    // Python's cmath documentation: the sign of a zero picks the side of a cut (from memory).
    expect([answer.reply.convention, cmath.convention]).toEqual(['signed-zero', 'signed-zero']);
  });

  it('builds the arguments through the entry a request names, and refuses one it lacks, listing its entries', async () => {
    // complex("-4-0j") keeps the −0 (Python parses each part's sign), so sqrt gives −2i as through complex(re, im).
    expect(await cmath.evaluate('sqrt', [[[-4, -0]], [[-4, 0]]], 'string')).toEqual([
      { value: [0, -2] },
      { value: [0, 2] },
    ]);
    expect(await cmath.evaluate('sqrt', [[[-4, -0]]], 'parser')).toEqual([
      { error: 'cmath@' + cmath.version + ' has no entry "parser"; its entries are complex, string' },
    ]);
    const raw = await cmath.request('sqrt', [['-4', '-0']], 'number');
    expect('reply' in raw && raw.reply.error).toBe("no entry 'number'; the entries are complex, string");
  });

  it('returns 0 − 2i for sqrt(−4 − 0i) and 0 + 2i for sqrt(−4 + 0i)', async () => {
    const [below, above] = await cmath.evaluate('sqrt', [[[-4, -0]], [[-4, 0]]]);
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)); the principal root of −4 + 0i is 2i.
    expect(value(below)).toEqual([0, -2]);
    expect(value(above)).toEqual([0, 2]);
  });

  it('follows the Annex G special values of csqrt, cexp, casinh, catanh, cacos and cacosh', async () => {
    const cases: [string, ComplexPair, ComplexPair][] = [
      // ISO/IEC 9899:2011 G.6.4.2: csqrt(±0 + i0) returns +0 + i0.
      ['sqrt', [-0, 0], [0, 0]],
      // G.6.4.2 with conjugate symmetry: csqrt(−0 − i0) = +0 − i0.
      ['sqrt', [-0, -0], [0, -0]],
      // G.6.4.2: csqrt(x + i∞) returns +∞ + i∞ for all x.
      ['sqrt', [-3, Infinity], [Infinity, Infinity]],
      // G.6.4.2: csqrt(−∞ + iy) returns +0 + i∞ for finite positive-signed y.
      ['sqrt', [-Infinity, 2], [0, Infinity]],
      // G.6.3.1: cexp(±0 + i0) returns 1 + i0.
      ['exp', [-0, 0], [1, 0]],
      // G.6.3.2: clog(+∞ + i∞) returns +∞ + iπ/4.
      ['log', [Infinity, Infinity], [Infinity, Math.PI / 4]],
      // G.6.2.2: casinh(+0 + i0) returns +0 + i0.
      ['asinh', [0, 0], [0, 0]],
      // G.6.2.3: catanh(+0 + i0) returns +0 + i0.
      ['atanh', [0, 0], [0, 0]],
      // G.6.1.1: cacos(±0 + i0) returns π/2 − i0.
      ['acos', [-0, 0], [Math.PI / 2, -0]],
      // G.6.2.1: cacosh(±0 + i0) returns +0 + iπ/2.
      ['acosh', [-0, 0], [0, Math.PI / 2]],
    ];
    for (const [op, z, expected] of cases) {
      const [result] = await cmath.evaluate(op, [[z]]);
      expect({ op, z, result: value(result) }).toEqual({ op, z, result: expected });
    }
  });

  it('answers an error result where C returns a pole and cmath raises: clog(−0 + i0), catanh(1 + i0)', async () => {
    // G.6.3.2 gives clog(−0 + i0) = −∞ + iπ with divide-by-zero; cmath raises ValueError instead.
    expect(await cmath.evaluate('log', [[[-0, 0]]])).toEqual([{ error: 'ValueError: math domain error' }]);
    // G.6.2.3 gives catanh(+1 + i0) = +∞ + i0 with divide-by-zero; cmath raises ValueError.
    expect(await cmath.evaluate('atanh', [[[1, 0]]])).toEqual([{ error: 'ValueError: math domain error' }]);
  });

  it('keeps batch order across a mixed batch where some calls fail', async () => {
    const results = await cmath.evaluate('log', [[[1, 0]], [[0, 0]], [[-1, 0]], [[-1, -0]]]);
    expect(results).toEqual([
      { value: [0, 0] },
      { error: 'ValueError: math domain error' },
      // log(−1 + i0) = iπ is the principal value; G.6.3.2's clog(conj(z)) = conj(clog(z)) makes it −iπ below the cut.
      { value: [0, Math.PI] },
      { value: [0, -Math.PI] },
    ]);
  });

  it('takes pow as a batch of (z, w) pairs: (−8 + 0i)^(1/3) is the principal cube root 1 + √3 i', async () => {
    const [root] = await cmath.evaluate('pow', [
      [
        [-8, 0],
        [1 / 3, 0],
      ],
    ]);
    const [re, im] = value(root);
    expect(re).toBeCloseTo(1, 15);
    expect(im).toBeCloseTo(Math.sqrt(3), 15);
  });

  it('reports cbrt, nthroot and the reciprocal functions as unsupported', async () => {
    for (const op of ['cbrt', 'nthroot', 'acot', 'asech']) expect(await cmath.supports(op)).toBe(false);
    expect(await cmath.supports('asin')).toBe(true);
  });

  it('answers a line that is not JSON with an error line and keeps serving', async () => {
    const child = spawn('/usr/bin/python3', [SCRIPT], { stdio: ['pipe', 'pipe', 'inherit'] });
    let out = '';
    child.stdout.on('data', (chunk: Buffer) => (out += chunk.toString()));
    child.stdin.end(
      'not json\n{"id": 9, "op": "sqrt", "args": [["4", "-0"]]}\n{"id": 10, "op": "sqrt", "args": [[4, 0]]}\n{"id": 11, "op": "frobnicate", "args": []}\n',
    );
    await new Promise((resolve) => child.on('exit', resolve));
    const lines = out
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l) as Record<string, unknown>);
    expect(lines).toEqual([
      { id: null, error: expect.stringMatching(/^not JSON/) },
      { id: 9, results: [['2.0', '-0.0']] },
      { id: 10, results: [{ error: expect.stringMatching(/numbers travel as strings/) }] },
      { id: 11, error: "unsupported op 'frobnicate'" },
    ]);
  });
});
