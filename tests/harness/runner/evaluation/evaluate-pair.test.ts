import type { Target } from '../../../../harness/adapters/target';
import type { TargetDescriptor } from '../../../../harness/adapters/target-descriptor';
import { buildPath } from '../../../../harness/paths/build-path';
import { evaluatePair } from '../../../../harness/runner/evaluation/evaluate-pair';
import { toPathSpec } from '../../../../harness/runner/evaluation/to-path-spec';
import { seededReferenceCache } from '../../../setup/seeded-reference-cache';
import type { Suite } from '../../../../shared/schemas/suite-schema';
import { loadDemoSuite } from '../support/load-demo-suite';
import { referenceTarget } from '../support/reference-target';

const cache = seededReferenceCache();
const descriptorOf = (open: () => Target): TargetDescriptor => ({
  name: 'oracle@1',
  library: 'oracle',
  version: '1',
  settings: {},
  open,
});
/** A target that answers nothing, ever (a library stuck waiting), and says whether it was closed. */
function silent(): Target & { closed: boolean } {
  const target = {
    ...referenceTarget(),
    closed: false,
    evaluate: () => new Promise<never>(() => undefined),
    close: async () => {
      target.closed = true;
    },
  };
  return target;
}
const pointKeys = (suite: Suite): Set<string> =>
  new Set(
    suite.paths.flatMap((p) =>
      buildPath(toPathSpec(p)).map((pt) => [pt.z.re, pt.z.im].map((x) => (Object.is(x, -0) ? '-0' : String(x))).join()),
    ),
  );

describe('evaluatePair', () => {
  const sqrt = loadDemoSuite('sqrt-principal-sz');

  it("evaluates the values and then the suite's property checks with their pinned seeds, and keeps the target open", async () => {
    const target = referenceTarget();
    const { result, target: open } = await evaluatePair(
      sqrt,
      descriptorOf(() => target),
      {
        cache,
        properties: { seed: null },
      },
    );
    expect(result.status).toBe('pass');
    expect(result.counts.pass).toBe(result.checked.points);
    expect(result.properties?.map((p) => [p.law, p.kind, p.seed])).toEqual(
      sqrt.properties.map((p) => [p.law, 'held', p.seed]),
    );
    expect(result.checked.properties).toEqual({
      listed: ['conjugate-symmetry', 'root-power', 'range'],
      run: true,
      note: '3 property check(s) run',
    });
    expect(open).toBe(target);
  });

  it('replaces every pinned seed with the seed it is given', async () => {
    const { result } = await evaluatePair(sqrt, descriptorOf(referenceTarget), { cache, properties: { seed: 7 } });
    expect(result.properties?.map((p) => p.seed)).toEqual([7, 7, 7]);
  });

  it('says the property checks were listed but not run when not asked to run them', async () => {
    const { result } = await evaluatePair(sqrt, descriptorOf(referenceTarget), { cache });
    expect(result.properties).toBeNull();
    expect(result.checked.properties).toEqual({
      listed: ['conjugate-symmetry', 'root-power', 'range'],
      run: false,
      note: 'listed in the suite but not run by this run',
    });
  });

  it('fails a pair whose values all pass when a property check fails', async () => {
    // Right at every point of the paths, the other sheet everywhere else: only the range law can see it.
    const onPaths = pointKeys(sqrt);
    const offSheet = referenceTarget('off-sheet@1', (op, [z], v) =>
      op === 'sqrt' && !onPaths.has(z!.map((x) => (Object.is(x, -0) ? '-0' : String(x))).join()) ? [-v[0], -v[1]] : v,
    );
    const { result } = await evaluatePair(
      sqrt,
      descriptorOf(() => offSheet),
      { cache, properties: { seed: null } },
    );
    expect(result.counts).toEqual({ pass: result.checked.points, fail: 0, error: 0, skipped: 0, notApplicable: 0 });
    expect(result.properties?.find((p) => p.law === 'range')?.kind).toBe('failed');
    expect(result.status).toBe('fail');
  });

  it('stops a target that does not answer at the time limit: every point an error with the reason, the tolerance text as in a result of its own, the target closed', async () => {
    const target = silent();
    const started = Date.now();
    const { result, target: open } = await evaluatePair(
      sqrt,
      descriptorOf(() => target),
      {
        cache,
        timeLimitMs: 300,
        properties: { seed: null },
      },
    );
    expect(Date.now() - started).toBeLessThan(5_000);
    expect(result.status).toBe('error');
    expect(result.errors).toEqual([
      'oracle@1 did not finish within the time limit of 300 ms; the evaluation was stopped and the target restarted',
    ]);
    expect(result.checked.points).toBe(154);
    expect(result.counts).toEqual({ pass: 0, fail: 0, error: 154, skipped: 0, notApplicable: 0 });
    expect(result.checked.tolerance).toBe('4 ulps per part or relative error 8.881784197001252e-16 (4 eps)');
    expect(result.checked.paths).toBe(sqrt.paths.length);
    expect(target.closed).toBe(true);
    expect(open).toBeNull();
  });

  it('gives the same error result when the target cannot be opened, naming why', async () => {
    const { result, target } = await evaluatePair(
      sqrt,
      descriptorOf(() => {
        throw new Error('no such library');
      }),
      { cache, paths: [1], pathPoints: [40, 65, 49] },
    );
    expect(result.errors).toEqual(['the evaluation failed: no such library']);
    expect(result.paths.map((p) => [p.name, p.counts.error, p.error])).toEqual([
      ['around branch point 1', 65, 'the evaluation failed: no such library'],
    ]);
    expect(result.checked.tolerance).toBe('4 ulps per part or relative error 8.881784197001252e-16 (4 eps)');
    expect(target).toBeNull();
  });

  it('turns a cancellation into skipped points with the reason it was given, and closes the target', async () => {
    const target = silent();
    const controller = new AbortController();
    setTimeout(() => controller.abort(new Error('cancelled: the reviewer stopped it')), 100);
    const { result, target: open } = await evaluatePair(
      sqrt,
      descriptorOf(() => target),
      {
        cache,
        signal: controller.signal,
      },
    );
    expect(result.status).toBe('cancelled');
    expect(result.counts).toEqual({ pass: 0, fail: 0, error: 0, skipped: 154, notApplicable: 0 });
    expect(result.paths[0]!.skipped).toEqual([{ reason: 'cancelled: the reviewer stopped it', count: 40 }]);
    expect(target.closed).toBe(true);
    expect(open).toBeNull();
  });
});
