import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { cAdapterBinary } from '../../../harness/adapters/c-adapter-binary';
import { C_COMPLEX_ENTRIES } from '../../../harness/adapters/c-complex-entries';
import { C_ADAPTER_SOURCE, cComplexTarget } from '../../../harness/adapters/c-complex-target';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import type { StdioTarget } from '../../../harness/adapters/stdio-target';
import { C_AND_NUMPY_OPS } from './fixtures/c-and-numpy-ops';
import { ECHO_INPUTS } from './fixtures/echo-inputs';
import { valueOf } from './fixtures/value-of';
import { systemLibcVersion } from '../../../harness/adapters/system-libc-version';

// Annex G's rules below are quoted from ISO/IEC 9899:2011 (C11) Annex G; the clause is named beside
// each. glibc's <complex.h> (2.36) meets every one of them: a deviation would be kept here as a
// finding about the library, with the clause, not dropped.
describe('the C library through the stdio protocol', () => {
  let cache: string;
  let target: StdioTarget;
  const libc = systemLibcVersion();
  beforeAll(() => {
    cache = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-c-target-'));
    target = cComplexTarget({ ...libc, cache });
  });
  afterAll(async () => {
    await target.close();
    rmSync(cache, { recursive: true, force: true });
  });

  it('starts nothing until first used, then describes itself as the system C library with its entries', async () => {
    expect(target.processId()).toBeNull();
    const answer = await target.request('describe', []);
    if (!('reply' in answer)) throw new Error(answer.error);
    expect(target.processId()).not.toBeNull();
    expect(answer.reply).toEqual({
      id: expect.any(Number),
      library: libc.library,
      version: libc.version,
      ops: C_AND_NUMPY_OPS,
      entries: C_COMPLEX_ENTRIES,
      // ISO/IEC 9899:2011 G.6: the sign of a zero picks the side of a cut; the target states the same.
      convention: 'signed-zero',
    });
    expect(target.convention).toBe('signed-zero');
    expect(target.name).toBe(`${libc.library}@${libc.version}`);
    expect(target.entries).toEqual(C_COMPLEX_ENTRIES);
  });

  it('names its built adapter as the program adapter-check starts', async () => {
    const program = await target.program();
    expect(program).toEqual({ kind: 'program', command: [expect.stringContaining(path.join(cache, 'c-adapter'))] });
    expect(
      spawnSync(program.command[0]!, [], {
        input: '{"id": 1, "op": "neg", "args": [["-0", "1"]]}\n',
      }).stdout.toString(),
    ).toMatch(/^\{"id": ?1, ?"results": ?\[\["0", ?"-1"\]\]\}\n$/);
  });

  it('echoes −0, subnormals, the largest double, infinities, NaN and hex floats exactly, as shortest decimals', async () => {
    const answer = await target.request('echo', [
      ...ECHO_INPUTS,
      ['0.1', '0.3333333333333333'],
      ['1e-5', '123456789012345680000'],
    ]);
    expect('reply' in answer && answer.reply.results).toEqual([
      ['-0', '5e-324'],
      ['2.2250738585072014e-308', '-1.7976931348623157e+308'],
      ['inf', '-inf'],
      ['nan', '-3'],
      ['0.1', '0.3333333333333333'],
      ['1e-05', '1.2345678901234568e+20'],
    ]);
  });

  it('echoes through the arithmetic entry what GCC makes of re + im * I: +0 for a −0 real part beside +0, NaN beside ∞', async () => {
    const answer = await target.request(
      'echo',
      [
        ['-0', '0'],
        ['-0', '-1'],
        ['2', '-0'],
        ['1', 'inf'],
      ],
      'arithmetic',
    );
    expect('reply' in answer && answer.reply.results).toEqual([
      ['0', '0'],
      ['-0', '-1'],
      ['2', '-0'],
      ['nan', 'inf'],
    ]);
  });

  it('returns 0 − 2i for csqrt(−4 − 0i) and 0 + 2i for csqrt(−4 + 0i)', async () => {
    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)); the principal root of −4 + 0i is 2i.
    expect(await target.evaluate('sqrt', [[[-4, -0]], [[-4, 0]]])).toEqual([{ value: [0, -2] }, { value: [0, 2] }]);
  });

  it('follows the Annex G special values of csqrt, cexp, clog, casinh, catanh, cacos and cacosh', async () => {
    const cases: [string, ComplexPair, ComplexPair][] = [
      // ISO/IEC 9899:2011 G.6.4.2: csqrt(±0 + i0) returns +0 + i0.
      ['sqrt', [-0, 0], [0, 0]],
      // G.6.4.2: csqrt(x + i∞) returns +∞ + i∞ for all x (including NaN).
      ['sqrt', [NaN, Infinity], [Infinity, Infinity]],
      // G.6.4.2: csqrt(−∞ + iy) returns +0 + i∞ for finite positive-signed y.
      ['sqrt', [-Infinity, 2], [0, Infinity]],
      // G.6.4.2: csqrt(+∞ + iy) returns +∞ + i0 for finite positive-signed y.
      ['sqrt', [Infinity, 2], [Infinity, 0]],
      // G.6.3.1: cexp(±0 + i0) returns 1 + i0.
      ['exp', [-0, 0], [1, 0]],
      // G.6.3.1: cexp(+∞ + i0) returns +∞ + i0.
      ['exp', [Infinity, 0], [Infinity, 0]],
      // G.6.3.1: cexp(−∞ + iy) returns +0 cis(y) for finite y: +0·cos 1 + i(+0·sin 1).
      ['exp', [-Infinity, 1], [0, 0]],
      // G.6.3.2: clog(−0 + i0) returns −∞ + iπ (divide-by-zero).
      ['log', [-0, 0], [-Infinity, Math.PI]],
      // G.6.3.2: clog(+0 + i0) returns −∞ + i0 (divide-by-zero).
      ['log', [0, 0], [-Infinity, 0]],
      // G.6.3.2: clog(−∞ + iy) returns +∞ + iπ for finite positive-signed y.
      ['log', [-Infinity, 3], [Infinity, Math.PI]],
      // G.6.3.2: clog(+∞ + i∞) returns +∞ + iπ/4.
      ['log', [Infinity, Infinity], [Infinity, Math.PI / 4]],
      // G.6.2.2: casinh(+0 + i0) returns +0 + i0.
      ['asinh', [0, 0], [0, 0]],
      // G.6.2.2: casinh(x + i∞) returns +∞ + iπ/2 for positive-signed finite x.
      ['asinh', [1, Infinity], [Infinity, Math.PI / 2]],
      // G.6.2.3: catanh(+0 + i0) returns +0 + i0.
      ['atanh', [0, 0], [0, 0]],
      // G.6.2.3: catanh(+1 + i0) returns +∞ + i0 (divide-by-zero).
      ['atanh', [1, 0], [Infinity, 0]],
      // G.6.2.3: catanh(x + i∞) returns +0 + iπ/2 for finite positive-signed x.
      ['atanh', [2, Infinity], [0, Math.PI / 2]],
      // G.6.1.1: cacos(±0 + i0) returns π/2 − i0.
      ['acos', [-0, 0], [Math.PI / 2, -0]],
      // G.6.1.1: cacos(−∞ + i∞) returns 3π/4 − i∞.
      ['acos', [-Infinity, Infinity], [(3 * Math.PI) / 4, -Infinity]],
      // G.6.2.1: cacosh(±0 + i0) returns +0 + iπ/2.
      ['acosh', [-0, 0], [0, Math.PI / 2]],
      // G.6.2.1: cacosh(−∞ + iy) returns +∞ + iπ for positive-signed finite y.
      ['acosh', [-Infinity, 1], [Infinity, Math.PI]],
    ];
    for (const [op, z, expected] of cases) {
      const [result] = await target.evaluate(op, [[z]]);
      expect({ op, z, result: valueOf(result) }).toEqual({ op, z, result: expected });
    }
  });

  it("multiplies and divides with Annex G's infinities: GCC's operators, not the textbook formulas", async () => {
    // ISO/IEC 9899:2011 G.5.1: an infinity times a nonzero finite number is an infinity (the
    // textbook (ac − bd) + i(ad + bc) gives NaN + iNaN for (∞ + i∞)(1 + i)).
    const [product] = await target.evaluate('mul', [
      [
        [Infinity, Infinity],
        [1, 1],
      ],
    ]);
    expect(valueOf(product).some((part) => Math.abs(part) === Infinity)).toBe(true);
    // G.5.1: a nonzero finite number divided by a zero is an infinity.
    const [quotient] = await target.evaluate('div', [
      [
        [1, 1],
        [0, 0],
      ],
    ]);
    expect(valueOf(quotient).some((part) => Math.abs(part) === Infinity)).toBe(true);
    // G.5.1: a finite number divided by an infinity is a zero.
    const [zero] = await target.evaluate('div', [
      [
        [1, 1],
        [Infinity, 0],
      ],
    ]);
    expect(valueOf(zero).map(Math.abs)).toEqual([0, 0]);
  });

  it('computes cpow(−8, 1/3) near the principal root 1 + √3 i', async () => {
    const [root] = await target.evaluate('pow', [
      [
        [-8, 0],
        [1 / 3, 0],
      ],
    ]);
    const [re, im] = valueOf(root);
    expect(re).toBeCloseTo(1, 14);
    expect(im).toBeCloseTo(Math.sqrt(3), 14);
  });

  it('answers each call of a batch in order, a bad argument in its own slot', async () => {
    const answer = await target.request('log', [['1', '0'], ['x', '0'], ['-1', '-0'], '1']);
    expect('reply' in answer && answer.reply.results).toEqual([
      ['0', '0'],
      { error: 'not a number: "x"' },
      ['0', '-3.141592653589793'],
      { error: 'a complex number is a pair [re, im]' },
    ]);
  });

  it('reports cbrt, nthroot and the reciprocal functions as unsupported, and refuses an entry it lacks', async () => {
    for (const op of ['cbrt', 'nthroot', 'acot', 'asech']) expect(await target.supports(op)).toBe(false);
    const raw = await target.request('sqrt', [['-4', '-0']], 'string');
    expect('reply' in raw && raw.reply.error).toBe('no entry "string"; the entries are cmplx, arithmetic');
  });

  it('answers hostile lines with the protocol error answers and keeps serving', async () => {
    const binary = await cAdapterBinary({
      source: C_ADAPTER_SOURCE,
      compiler: '/usr/bin/gcc',
      folder: path.join(cache, 'c-adapter'),
    });
    const lines = [
      'not json',
      '{"id": 9, "op": "sqrt", "args": [["4", "-0"]]}',
      '{"id": 10, "op": "sqrt", "args": [[4, 0]]}',
      '{"id": 11, "op": "frobnicate", "args": []}',
      '{"id": 12, "op": "sqrt", "args": [["\\ud800", "0"]]}',
      '{"id": 13, "op": "sqrt", "args": [["4", "0"]]} trailing',
      '{"id": 14, "op": "sqrt", "args": [["4\u0000", "0"]]}',
      `{"id": 15, "op": "sqrt", "args": ${'['.repeat(100)}${']'.repeat(100)}}`,
      '{"id": 16, "op": "sqrt", "args": [["1e400", "-1e-400"]]}',
      '[1, 2]',
    ];
    const run = spawnSync(binary, [], { input: lines.join('\n') + '\n', encoding: 'utf8', timeout: 5000 });
    expect(run.status).toBe(0);
    expect(
      run.stdout
        .trim()
        .split('\n')
        .map((l) => JSON.parse(l) as unknown),
    ).toEqual([
      { id: null, error: 'not JSON: unexpected character at column 1' },
      { id: 9, results: [['2', '-0']] },
      { id: 10, results: [{ error: 'numbers travel as strings' }] },
      { id: 11, error: 'unsupported op "frobnicate"' },
      { id: null, error: expect.stringMatching(/^not JSON: \\u escape outside ASCII/) },
      { id: null, error: expect.stringMatching(/^not JSON: text after the JSON value/) },
      { id: null, error: 'not JSON: NUL character in the line' },
      { id: null, error: expect.stringMatching(/^not JSON: nested too deep/) },
      // strtod rounds past the range as a correctly rounded reader must: to ∞ and to −0.
      { id: 16, results: [['inf', '-0']] },
      { id: null, error: 'a request is {"id", "op", "args": [...]}' },
    ]);
  });
});
