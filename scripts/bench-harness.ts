/**
 * `npm run bench:harness` — the runner's two cost figures (issue item 13), in one run:
 *
 * A. Value checks with cached references against a bare loop. For ten catalogue functions on
 *    complex.js, the same points are checked twice: by evaluateSuite (path generation, cached
 *    reference lookup by point bits, the adapter's batched calls, sign-exact comparison in ulps,
 *    jump detection) and by a bare loop of `new Complex(re, im)[fn]()` plus an ulp comparison
 *    against the same expected values already in an array. Target: harness ≥ 0.5× the bare loop.
 * B. A 1,000,000-point plan end to end without the database: 10 suites × complex.js, 100,000
 *    points each, on 2 worker threads, first with an empty reference cache (every reference value
 *    computed) and then again with it filled. Target: ≤ 30 s on 2 cores.
 *
 * Figures go to stdout; nothing is written outside a temporary folder.
 */
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import {
  buildPath,
  buildPlan,
  discoverTargets,
  evaluateSuite,
  ReferenceCache,
  runPlan,
  suiteCacheKey,
  type TargetDescriptor,
  toPathSpec,
  ulpsApart,
} from '../harness';
import type { Suite } from '../shared/schemas/suite-schema';
import { validateSuite } from '../shared/validate-suite';

const FUNCTIONS = ['sqrt', 'log', 'exp', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh', 'acot'];
const POINTS_PER_SUITE = 100_000;

function suiteFor(fn: string, samples: number): Suite {
  const checked = validateSuite(
    {
      id: `bench-${fn}`,
      version: 1,
      title: `bench ${fn}`,
      subject: `${fn}(z)`,
      branch: { kind: 'principal' },
      convention: 'signed-zero',
      paths: [
        {
          kind: 'circle',
          name: 'radius 2',
          center: { re: '0', im: '0' },
          radius: '2',
          start_angle: '0.1',
          samples: samples / 2,
        },
        {
          kind: 'circle',
          name: 'around 1',
          center: { re: '1', im: '0' },
          radius: '0.75',
          start_angle: '0.1',
          samples: samples / 2,
        },
      ],
      tolerances: { values: { ulps: 4 } },
    },
    fn,
  );
  if (!checked.ok) throw new Error(JSON.stringify(checked.issues));
  return checked.suite;
}

const seconds = (ms: number) => (ms / 1000).toFixed(2);
const rate = (n: number, ms: number) => `${(((n / ms) * 1000) / 1e6).toFixed(2)} M/s`;

async function main(): Promise<void> {
  const complexJs = discoverTargets().find((t) => t.name === 'complex.js@2.4.3');
  if (!complexJs) throw new Error('complex.js@2.4.3 is not installed');
  const ref: TargetDescriptor = {
    name: complexJs.name,
    library: complexJs.library,
    version: complexJs.version,
    settings: complexJs.settings,
    open: () => complexJs.open(),
    worker: { discovered: complexJs.name },
  };
  const dir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-bench-'));
  try {
    console.log(
      `bench:harness on ${os.cpus().length} core(s), ${os.cpus()[0]?.model ?? 'unknown CPU'}, Node ${process.versions.node}`,
    );

    // B first: it also fills the cache that A reads.
    const suites = FUNCTIONS.map((fn) => suiteFor(fn, POINTS_PER_SUITE));
    const plan = buildPlan(suites, [ref]);
    const total = plan.slices.reduce((s, sh) => s + sh.points, 0);
    let t0 = performance.now();
    const cold = await runPlan(plan, { cacheDir: dir, workers: 2 });
    const coldMs = performance.now() - t0;
    t0 = performance.now();
    const warm = await runPlan(buildPlan(suites, [ref]), { cacheDir: dir, workers: 2 });
    const warmMs = performance.now() - t0;
    console.log(
      `\nB. ${total.toLocaleString('en')}-point plan (${suites.length} suites × complex.js, ${plan.slices.length} slices), 2 worker threads, no database:`,
    );
    console.log(
      `   empty cache: ${seconds(coldMs)} s (${cold.reference.computed.toLocaleString('en')} reference values computed) — target ≤ 30 s`,
    );
    console.log(
      `   filled cache: ${seconds(warmMs)} s (${warm.reference.computed} computed, ${warm.reference.cached.toLocaleString('en')} from the cache)`,
    );
    console.log(`   outcomes: ${JSON.stringify(warm.counts)} ${JSON.stringify(warm.byDiagnosis)}`);

    // A: the same points, harness vs bare loop, in this process, cache filled.
    console.log(
      '\nA. value checks with cached references (evaluateSuite, in process) vs a bare loop of call + ulp comparison:',
    );
    const cache = new ReferenceCache(dir);
    const target = complexJs.open();
    // eslint-disable-next-line @typescript-eslint/no-require-imports -- the bare loop uses the library as a plain CommonJS module
    const Complex = require('complex.js') as new (
      re: number,
      im: number,
    ) => Record<string, () => { re: number; im: number }>;
    let harnessMs = 0;
    let bareMs = 0;
    let points = 0;
    const rows: string[] = [];
    for (const suite of suites.map((s) => ({ ...s }))) {
      const fn = suite.subject.slice(0, suite.subject.indexOf('('));
      // Points and expected values for the bare loop, from the same paths and the same cache.
      const pts = suite.paths.flatMap((p) => buildPath(toPathSpec(p)));
      const n = pts.length;
      const re = Float64Array.from(pts, (p) => p.z.re);
      const im = Float64Array.from(pts, (p) => p.z.im);
      const expected = new Float64Array(2 * n);
      const key = suiteCacheKey(suite);
      for (let i = 0; i < n; i++)
        if (!cache.get(key, 0, re[i] as number, im[i] as number, expected, 2 * i)) throw new Error('cache miss');
      await evaluateSuite(suite, target, { cache }); // warm-up (JIT, lazy require)
      let best = Infinity;
      for (let k = 0; k < 3; k++) {
        const t = performance.now();
        const r = await evaluateSuite(suite, target, { cache });
        best = Math.min(best, performance.now() - t);
        if (r.reference.computed !== 0) throw new Error('a reference value was computed');
      }
      let bareBest = Infinity;
      let sink = 0;
      for (let k = 0; k < 4; k++) {
        const t = performance.now();
        let passed = 0;
        for (let i = 0; i < n; i++) {
          const v = new Complex(re[i] as number, im[i] as number)[fn]!();
          const u = Math.max(
            ulpsApart(v.re, expected[2 * i] as number),
            ulpsApart(v.im, expected[2 * i + 1] as number),
          );
          if (u <= 4) passed++;
        }
        sink += passed;
        bareBest = Math.min(bareBest, performance.now() - t);
      }
      if (sink < 0) console.log(sink);
      harnessMs += best;
      bareMs += bareBest;
      points += n;
      rows.push(
        `   ${fn.padEnd(6)} harness ${rate(n, best).padStart(9)}   bare ${rate(n, bareBest).padStart(9)}   ratio ${(bareBest / best).toFixed(2)}`,
      );
    }
    await target.close();
    console.log(rows.join('\n'));
    console.log(
      `   all    harness ${rate(points, harnessMs).padStart(9)}   bare ${rate(points, bareMs).padStart(9)}   ratio ${(bareMs / harnessMs).toFixed(2)} — target ≥ 0.5`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

main().catch((e: unknown) => {
  console.error(e);
  process.exitCode = 1;
});
