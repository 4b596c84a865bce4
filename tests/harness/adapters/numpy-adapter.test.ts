import { spawnSync } from 'node:child_process';
import path from 'node:path';
import type { ComplexPair } from '../../../harness/adapters/complex-pair';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { NUMPY_ENTRIES } from '../../../harness/adapters/numpy-entries';
import type { StdioTarget } from '../../../harness/adapters/stdio-target';
import { C_AND_NUMPY_OPS } from './fixtures/c-and-numpy-ops';
import { ECHO_INPUTS } from './fixtures/echo-inputs';
import { valueOf } from './fixtures/value-of';
import { askPython } from '../../external/python-oracle';
import { unhex } from '../../external/unhex';

const SCRIPT = path.join(__dirname, '..', '..', '..', 'harness', 'adapters', 'python', 'numpy_adapter.py');

describe('NumPy through the stdio protocol', () => {
  let numpy: StdioTarget;
  beforeAll(() => {
    const descriptor = discoverTargets().find((t) => t.library === 'numpy');
    if (!descriptor)
      throw new Error('no numpy target: /usr/bin/python3 has no numpy (scripts/lib.sh installs python3-numpy)');
    numpy = descriptor.open() as StdioTarget;
  });
  afterAll(async () => {
    await numpy.close();
  });

  it('names itself after the NumPy version it imports and lists the entries declared beside discovery', async () => {
    const answer = await numpy.request('describe', []);
    if (!('reply' in answer)) throw new Error(answer.error);
    expect(numpy.name).toBe(`numpy@${String(answer.reply.version)}`);
    expect(answer.reply.library).toBe('numpy');
    expect(answer.reply.entries).toEqual(NUMPY_ENTRIES);
    expect(numpy.entries).toEqual(NUMPY_ENTRIES);
    // NumPy's complex functions are the C library's (docs/c-and-numpy-adapters.md): Annex G's signed zeros.
    expect([answer.reply.convention, numpy.convention]).toEqual(['signed-zero', 'signed-zero']);
    expect(answer.reply.ops).toEqual(C_AND_NUMPY_OPS);
  });

  it('echoes −0, subnormals, infinities, NaN and hex floats exactly through complex128', async () => {
    const answer = await numpy.request('echo', ECHO_INPUTS);
    expect('reply' in answer && answer.reply.results).toEqual([
      ['-0.0', '5e-324'],
      ['2.2250738585072014e-308', '-1.7976931348623157e+308'],
      ['inf', '-inf'],
      ['nan', '-3.0'],
    ]);
  });

  it('echoes through the arithmetic entry what re + im * 1j makes: both zero signs of (−0, −0) lost to +0 and NaN beside ∞', async () => {
    const answer = await numpy.request(
      'echo',
      [
        ['-0', '-0'],
        ['-0', '-1'],
        ['1', 'inf'],
      ],
      'arithmetic',
    );
    expect('reply' in answer && answer.reply.results).toEqual([
      ['-0.0', '0.0'],
      ['-0.0', '-1.0'],
      ['nan', 'inf'],
    ]);
  });

  it('takes the side of each cut from the sign of zero, as cmath does, through the scalar and the array entries', async () => {
    const calls: ComplexPair[][] = [[[-4, -0]], [[-4, 0]]];
    for (const entry of ['complex128', 'array']) {
      // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)); cmath answers 0 − 2i and 0 + 2i.
      expect({ entry, results: await numpy.evaluate('sqrt', calls, entry) }).toEqual({
        entry,
        results: [{ value: [0, -2] }, { value: [0, 2] }],
      });
      // G.6.3.2: clog(conj(z)) = conj(clog(z)); cmath answers −iπ and iπ for log(−1 ∓ 0i).
      expect(await numpy.evaluate('log', [[[-1, -0]], [[-1, 0]]], entry)).toEqual([
        { value: [0, -Math.PI] },
        { value: [0, Math.PI] },
      ]);
    }
  });

  it('agrees with mpmath to 4 ulps normwise off the cuts', async () => {
    const points: [string, ComplexPair][] = [
      ['sqrt', [0.5, 0.25]],
      ['exp', [-1.5, 2.75]],
      ['log', [3, -4]],
      ['asin', [0.25, -0.5]],
      ['acos', [-2, 0.125]],
      ['atan', [0.5, 2]],
      ['asinh', [-1, 3]],
      ['acosh', [2.5, -1]],
      ['atanh', [0.75, 0.25]],
    ];
    // mpmath, 60 digits (Debian python3-mpmath), rounded correctly to doubles.
    const reference = askPython<{ re_rounded: string; im_rounded: string }>(
      'mpmath',
      points.map(([fn, [x, y]]) => ({ fn, z: [String(x), String(y)] as [string, string] })),
    );
    for (const [k, [fn, z]] of points.entries()) {
      const [re, im] = valueOf((await numpy.evaluate(fn, [[z]]))[0]);
      const m = reference[k] as { re_rounded: string; im_rounded: string };
      const [mre, mim] = [unhex(m.re_rounded), unhex(m.im_rounded)];
      const error = Math.hypot(re - mre, im - mim) / Math.hypot(mre, mim);
      expect({ fn, z, error: error <= 4 * Number.EPSILON }).toEqual({ fn, z, error: true });
    }
  });

  it('answers log(0) with −∞ + 0i and keeps the floating-point warnings of the calls and of building the values out of stderr and the answers', () => {
    const run = spawnSync('/usr/bin/python3', [SCRIPT], {
      input:
        '{"id": 1, "op": "log", "args": [["0", "0"]]}\n' +
        '{"id": 2, "op": "log", "args": [["0", "0"]], "entry": "array"}\n' +
        'not json\n{"id": 3, "op": "frobnicate", "args": []}\n' +
        '{"id": 4, "op": "sqrt", "args": [["4", "0"], [4, 0], ["x", "0"]], "entry": "array"}\n\n' +
        '{"id": 5, "op": "sqrt", "args": [["1", "inf"]], "entry": "arithmetic"}\n',
      encoding: 'utf8',
      timeout: 10_000,
    });
    expect(run.stderr).toBe('');
    expect(
      run.stdout
        .trim()
        .split('\n')
        .map((l) => JSON.parse(l) as unknown),
    ).toEqual([
      // ISO/IEC 9899:2011 G.6.3.2: clog(+0 + i0) = −∞ + i0 with divide-by-zero (cmath raises ValueError instead).
      { id: 1, results: [['-inf', '0.0']] },
      { id: 2, results: [['-inf', '0.0']] },
      { id: null, error: expect.stringMatching(/^not JSON/) },
      { id: 3, error: "unsupported op 'frobnicate'" },
      {
        id: 4,
        results: [
          ['2.0', '0.0'],
          { error: expect.stringMatching(/numbers travel as strings/) },
          { error: "ValueError: could not convert string to float: 'x'" },
        ],
      },
      // Building 1 + inf·1j computes inf·0 (invalid): the warning stays out of stderr too. G.6.4.2:
      // csqrt(x + i∞) = +∞ + i∞ for all x, NaN included.
      { id: 5, results: [['inf', 'inf']] },
    ]);
  });
});
