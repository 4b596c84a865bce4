import { appendFileSync, mkdtempSync, readdirSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildPlan } from '../../../../harness/runner/plan/build-plan';
import { evaluateSuite } from '../../../../harness/runner/evaluation/evaluate-suite';
import { PointTable } from '../../../../harness/runner/reference-cache/point-table';
import { ReferenceCache } from '../../../../harness/runner/reference-cache/reference-cache';
import { runPlan } from '../../../../harness/runner/plan/run-plan';
import { suiteCacheKey } from '../../../../harness/runner/reference-cache/suite-cache-key';
import type { TargetDescriptor } from '../../../../harness/adapters/target-descriptor';
import { loadDemoSuite } from '../support/load-demo-suite';
import { referenceTarget } from '../support/reference-target';

describe('the reference cache', () => {
  let dir: string;
  beforeEach(() => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-cache-'));
  });
  afterEach(() => rmSync(dir, { recursive: true, force: true }));

  it('gives a run its result when the cache folder cannot be written, warning once that the values stay in memory', async () => {
    // A file where the folder should be: ENOTDIR for root too, as EACCES would be for a read-only
    // install (a global npm install of the CLI) for anyone else.
    writeFileSync(path.join(dir, 'file'), '');
    const cacheDir = path.join(dir, 'file', 'reference-cache');
    const warn = jest.spyOn(process, 'emitWarning').mockImplementation(() => undefined);
    try {
      const plan = () =>
        buildPlan(
          [loadDemoSuite('sqrt-principal-sz'), loadDemoSuite('log-principal-sz')],
          [
            {
              name: 'oracle@1',
              library: 'oracle',
              version: '1',
              settings: {},
              open: () => referenceTarget('oracle@1'),
            },
          ],
        );
      const unwritable = await runPlan(plan(), { cacheDir });
      const inMemory = await runPlan(plan(), { cacheDir: null });
      expect(unwritable.status).toBe('pass');
      expect(unwritable.counts).toEqual(inMemory.counts);
      expect(warn).toHaveBeenCalledTimes(1);
      expect(String(warn.mock.calls[0]?.[0])).toContain(`the reference cache folder ${cacheDir} cannot be written`);
    } finally {
      warn.mockRestore();
    }
  });

  it('lets a repeated run compute no reference value, failures and their alternatives included', async () => {
    // A library that ignores −0 fails on the cut, so the second run also needs the alternatives (flipped zero, limits).
    const lossy: TargetDescriptor = {
      name: 'lossy@1',
      library: 'oracle',
      version: '1',
      settings: {},
      open: () =>
        referenceTarget('lossy@1', (op, [z], v) => (Object.is(z![1], -0) && op !== 'mul' ? [v[0], -v[1]] : v)),
    };
    const plan = () =>
      buildPlan([loadDemoSuite('sqrt-principal-sz'), loadDemoSuite('sqrt-z2-minus-1-finite-cut')], [lossy]);
    const first = await runPlan(plan(), { cacheDir: dir });
    expect(first.counts.fail).toBeGreaterThan(0);
    expect(first.reference.computed).toBeGreaterThan(300);
    const second = await runPlan(plan(), { cacheDir: dir });
    expect(second.reference.computed).toBe(0);
    expect(second.reference.cached).toBeGreaterThanOrEqual(first.counts.pass + first.counts.fail);
    expect(second.results.map((r) => r.byDiagnosis)).toEqual(first.results.map((r) => r.byDiagnosis));
  });

  it('keeps one compact file per suite id, version and content, 40 bytes a value, and ignores a torn last record', async () => {
    const suite = loadDemoSuite('exp-principal-sz');
    const cache = new ReferenceCache(dir);
    await evaluateSuite(suite, referenceTarget(), { cache });
    cache.flush();
    const files = readdirSync(dir);
    expect(files).toEqual([`${suiteCacheKey(suite)}.bin`]);
    expect(files[0]).toMatch(/^exp-principal-sz@1-[0-9a-f]{12}\.bin$/);
    const file = path.join(dir, files[0]!);
    expect((statSync(file).size - 8) % 40).toBe(0);
    expect((statSync(file).size - 8) / 40).toBe(cache.computed);
    appendFileSync(file, Buffer.from([1, 2, 3, 4, 5, 6, 7]));
    const again = new ReferenceCache(dir);
    const r = await evaluateSuite(suite, referenceTarget(), { cache: again });
    expect(r.reference).toEqual({ computed: 0, cached: r.checked.points });
  });

  it('gives a new suite version its own values', () => {
    const suite = loadDemoSuite('exp-principal-sz');
    expect(suiteCacheKey({ ...suite, version: 2 })).not.toBe(suiteCacheKey(suite));
    expect(suiteCacheKey({ ...suite, subject: 'exp(2*z)' })).not.toBe(suiteCacheKey(suite));
    expect(suiteCacheKey({ ...suite, title: 'renamed' })).toBe(suiteCacheKey(suite));
  });

  it('tells +0 from −0 and grows without losing entries', () => {
    const t = new PointTable(4);
    for (let i = 0; i < 1000; i++) t.set(0, i, -0, i, 1);
    t.set(0, 5, 0, 99, 99);
    t.set(1, 5, -0, 77, 77);
    const out = [0, 0];
    expect(t.get(0, 5, -0, out) && out).toEqual([5, 1]);
    expect(t.get(0, 5, 0, out) && out).toEqual([99, 99]);
    expect(t.get(1, 5, -0, out) && out).toEqual([77, 77]);
    expect(t.get(0, 1000, -0, out)).toBe(false);
    expect(t.size).toBe(1002);
  });
});
