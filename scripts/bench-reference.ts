/**
 * `npm run bench:reference`: throughput of the reference engine against mpmath on the same
 * 10,000 seeded points, for correctly rounded doubles (principalDouble: the double-double tier,
 * falling back to the bigint engine) and for 40-digit strings (the bigint engine).
 *
 * mpmath runs in Debian's /usr/bin/python3 (python3-mpmath with the gmpy2 backend). Its
 * "doubles" mode is mp.prec = 53 and complex(f(z)) — mpmath's cheapest way to a double,
 * which is not even guaranteed correctly rounded, so the ratio is, if anything, unkind to us.
 * Its "strings" mode is mp.dps = 40 and nstr(part, 40). Both sides convert the input from the
 * same doubles and produce both parts. Each side makes one untimed pass, then ROUNDS rounds of
 * PASSES timed passes of ours and as many of mpmath's; each side's fastest counts. Bounded: fixed counts, and
 * each Python process is killed after 120 s.
 */
import { spawnSync } from 'node:child_process';
import os from 'node:os';
import { BigComplex, principalDouble, principalValue } from '../harness';
import { benchReferencePoints } from './bench-reference-points';

const N = 10_000;
const SEED = 12345;
const TARGET_DOUBLES = 30;
/**
 * Rounds of timed passes; the fastest pass of each mode and side is kept, since other work on the
 * machine only ever adds time. Each round times passes of ours and then of mpmath (a fresh Python
 * process, which first makes an untimed pass per mode), so both sides sample the same stretch of a
 * shared machine's load: timing all of ours first and all of mpmath's after, mpmath's best of
 * three ranged 39,000–58,000 doubles/s between runs a minute apart (ratios 18–39 for one engine).
 * Each round times PASSES passes per mode on each side: our doubles pass is ~6 ms, short enough
 * for one preemption on the shared cores to cost it a third (1.22–1.68 million/s between runs with
 * one pass a round, against mpmath's steady ~58,500/s over its 170 ms pass). A round costs mpmath
 * ~1.6 s with Python's start-up, us ~0.4 s; the bench takes ~12 s in all.
 */
const ROUNDS = 5;
const PASSES = 3;
const TARGET_STRINGS = 2;

const points = benchReferencePoints(N, SEED);

function ours(mode: 'doubles' | 'strings', count: number): number {
  const start = process.hrtime.bigint();
  for (let i = 0; i < count; i++) {
    const p = points[i] as (typeof points)[number];
    if (mode === 'doubles') {
      principalDouble(p.fn, p.x, p.y, 'signed-zero');
    } else {
      const r = principalValue(
        { fn: p.fn, z: BigComplex.fromDoubles(p.x, p.y), convention: 'signed-zero' },
        { double: false, digits: 40 },
      );
      r.approximation.re.toDecimal(40);
      r.approximation.im.toDecimal(40);
    }
  }
  return Number(process.hrtime.bigint() - start) / 1e9;
}

const PYTHON = `
import json, sys, time
import mpmath
from mpmath import mp, mpc, mpf
pts = json.load(sys.stdin)
fns = [(getattr(mpmath, p[0]), float(p[1]), float(p[2])) for p in pts]
def doubles_pass():
    t = time.perf_counter()
    for f, x, y in fns:
        complex(f(mpc(x, y)))
    return time.perf_counter() - t
def strings_pass():
    t = time.perf_counter()
    for f, x, y in fns:
        v = f(mpc(x, y))
        mpmath.nstr(v.real, 40); mpmath.nstr(v.imag, 40)
    return time.perf_counter() - t
mp.prec = 53
passes = int(sys.argv[1])
doubles_pass()
doubles = min(doubles_pass() for _ in range(passes))
mp.dps = 40
strings_pass()
strings = min(strings_pass() for _ in range(passes))
print(json.dumps({"doubles": doubles, "strings": strings, "backend": mpmath.libmp.BACKEND, "version": mpmath.__version__}))
`;

interface MpmathPass {
  doubles: number;
  strings: number;
  backend: string;
  version: string;
}

/** One Python process: an untimed pass and PASSES timed ones per mode; null (and a message) when it fails or overruns. */
function mpmathPass(): MpmathPass | null {
  const run = spawnSync('/usr/bin/python3', ['-c', PYTHON, String(PASSES)], {
    input: JSON.stringify(points.map((p) => [p.fn, String(p.x), String(p.y)])),
    encoding: 'utf8',
    timeout: 120_000,
  });
  if (run.status !== 0) {
    process.stderr.write(`mpmath run failed: ${run.stderr || run.error?.message}\n`);
    return null;
  }
  return JSON.parse(run.stdout) as MpmathPass;
}

function main(): void {
  // One untimed pass over the same points first: V8 compiles the hot paths and fills the
  // reduction tables (mpmath's untimed pass is in each of its processes).
  ours('doubles', N);
  ours('strings', N);
  const load = os.loadavg()[0] as number;
  let oursDoubles = Infinity;
  let oursStrings = Infinity;
  let mp: MpmathPass | null = null;
  for (let round = 0; round < ROUNDS; round++) {
    for (let i = 0; i < PASSES; i++) oursDoubles = Math.min(oursDoubles, ours('doubles', N));
    for (let i = 0; i < PASSES; i++) oursStrings = Math.min(oursStrings, ours('strings', N));
    const pass = mpmathPass();
    if (!pass) {
      process.exitCode = 1;
      return;
    }
    mp = mp
      ? { ...pass, doubles: Math.min(mp.doubles, pass.doubles), strings: Math.min(mp.strings, pass.strings) }
      : pass;
  }
  if (!mp) return;
  const rate = (seconds: number) => Math.round(N / seconds);
  const rows = [
    ['correctly rounded doubles', rate(oursDoubles), rate(mp.doubles), mp.doubles / oursDoubles, TARGET_DOUBLES],
    ['40-digit strings', rate(oursStrings), rate(mp.strings), mp.strings / oursStrings, TARGET_STRINGS],
  ] as const;
  process.stdout.write(
    `reference engine vs mpmath ${mp.version} (${mp.backend}), ${N} seeded points (seed ${SEED}), best of ${ROUNDS} interleaved rounds × ${PASSES} passes, load average ${load.toFixed(2)} → ${(os.loadavg()[0] as number).toFixed(2)}, ${[...new Set(points.map((p) => p.fn))].join(', ')}\n`,
  );
  process.stdout.write('mode                         ours (pts/s)   mpmath (pts/s)   ratio   target\n');
  for (const [mode, a, b, ratio, target] of rows) {
    process.stdout.write(
      `${mode.padEnd(28)} ${String(a).padStart(12)}   ${String(b).padStart(14)}   ${ratio.toFixed(2).padStart(5)}   ≥ ${target}  ${ratio >= target ? 'met' : 'NOT met'}\n`,
    );
  }
}

main();
