import type { DataSource } from 'typeorm';
import { FINGERPRINT_FUNCTIONS, libraryVersions, type TargetDescriptor } from '../../harness';
import type { ComputedAnswer } from '../../shared/computed-answer';
import type { ConventionFingerprint } from '../../shared/convention-fingerprint';
import type { CutMap } from '../../shared/cut-map';
import type { Suite } from '../../shared/schemas/suite-schema';
import type { VersionMatrix } from '../../shared/version-matrix';
import { FindingsPool } from './findings-pool';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { ResultCache } from './result-cache';
import { readyTargetSourceOf } from '../targets/ready-target-source-of';

/**
 * Measured here on the installed targets (in process, medians of a few runs, 2 cores):
 * - fingerprint, every function: complex.js 2.4.3 158 ms the first time, 81 ms after; mathjs
 *   15.2.0/complex 2.3 s the first time (loading mathjs ~1.1 s and the reference values), 91 ms
 *   after; cmath 104 ms (a Python child process started and stopped).
 * - cut map, 81×81: 6–240 ms (complex.js acot 237 ms); 201×201: 210–710 ms (cmath asin 708 ms);
 *   401×401: 0.7–4.3 s (cmath log 4.3 s). The request schema allows at most 201×201.
 * - version matrix: complex.js's seven versions, one suite 319 ms, three 347 ms, all 44 demo
 *   suites 5.7 s (481 KB of JSON); mathjs/complex's three versions 6.9 s for the first suite
 *   (three mathjs loads), 123 ms for three more after. The request allows eight suites at a time.
 * Every one of them passes 300 ms on a first visit somewhere, so every answer is kept. The
 * library code runs on a small pool of worker threads (findings-pool.ts), one request per thread,
 * so the server's thread keeps answering everyone else meanwhile.
 *
 * Answers depend only on the installed library versions (part of every target name, so part
 * of every key), the request, and for the matrix the suites' approved versions (in the key as
 * slug@version), so they are never stale within one process. 200 answers of at most ~100 KB
 * (a matrix group of eight suites) bound the memory to ~20 MB.
 */
const CAPACITY = 200;

type Timed<T> = { value: T; ms: number };

/** The convention fingerprint, cut maps and version matrices of installed targets, computed by the harness and kept in memory. */
export class LibraryFindings {
  private readonly cache = new ResultCache<Timed<unknown>>(CAPACITY);
  private readonly versionsByLibrary = new Map<string, TargetDescriptor[]>();

  constructor(
    private readonly dataSource: DataSource,
    private readonly thread = new FindingsPool(),
  ) {}

  async fingerprint(
    name: string,
    functionLabels: string[] | undefined,
    entry?: string,
  ): Promise<{ fingerprint: ConventionFingerprint } & ComputedAnswer> {
    const functions = functionLabels
      ? functionLabels.map(
          (label) => FINGERPRINT_FUNCTIONS.find((f) => f.label === label) ?? unknownFunction('query.fn', label),
        )
      : FINGERPRINT_FUNCTIONS;
    const labels = functions.map((f) => f.label);
    const added = await this.addedSource(name);
    const key = `fingerprint|${name}|${added?.id ?? ''}|${labels.join(',')}|${entry ?? ''}`;
    const { value, ms, fromCache } = await this.kept(key, () =>
      this.thread.ask({
        kind: 'fingerprint',
        target: name,
        functions: labels,
        ...(entry ? { entry } : {}),
        ...(added ? { added } : {}),
      }),
    );
    return { fingerprint: value as ConventionFingerprint, computedMs: ms, fromCache };
  }

  async cutMap(
    name: string,
    request: { fn: string; box: number[]; grid: number[] },
  ): Promise<{ cutMap: CutMap } & ComputedAnswer> {
    const fn = FINGERPRINT_FUNCTIONS.find((f) => f.label === request.fn) ?? unknownFunction('query.fn', request.fn);
    const box = request.box as [number, number, number, number];
    const grid = request.grid as [number, number];
    const added = await this.addedSource(name);
    const key = `cut-map|${name}|${added?.id ?? ''}|${fn.label}|${box.join(',')}|${grid[0]}x${grid[1]}`;
    const { value, ms, fromCache } = await this.kept(key, () =>
      this.thread.ask({ kind: 'cut-map', target: name, fn: fn.label, box, grid, ...(added ? { added } : {}) }),
    );
    return { cutMap: value as CutMap, computedMs: ms, fromCache };
  }

  async versionMatrix(
    library: string,
    slugs: string[],
    entries?: string[],
  ): Promise<{ matrix: VersionMatrix } & ComputedAnswer> {
    const targets = this.versionsOf(library);
    if (targets.length === 0)
      throw new HttpError(404, {
        kind: 'not-found',
        message: `No installed library "${library}" (a target name without "@version", e.g. complex.js).`,
      });
    if (targets.length < 2)
      throw new HttpError(409, {
        kind: 'conflict',
        message: `"${library}" has one installed version (${targets[0]!.version}); a version matrix needs two or more.`,
      });
    const rows: { slug: string; body: Suite }[] = await this.dataSource.query(
      `SELECT DISTINCT ON (s.slug) s.slug, v.body
         FROM suites s JOIN suite_versions v ON v.suite_id = s.id
        WHERE s.slug = ANY($1) AND v.status = 'approved'
        ORDER BY s.slug, v.version DESC`,
      [slugs],
    );
    const bySlug = new Map(rows.map((r) => [r.slug, r.body]));
    const absent = slugs.filter((s) => !bySlug.has(s));
    if (absent.length > 0)
      throw new InputError([{ field: 'query.suite', rule: `has no approved version: ${absent.join(', ')}` }]);
    const suites = [...new Set(slugs)].map((s) => bySlug.get(s)!);
    const key = `matrix|${targets.map((t) => t.name).join(',')}|${suites.map((s) => `${s.id}@${s.version}`).join(',')}|${(entries ?? []).join(',')}`;
    const { value, ms, fromCache } = await this.kept(key, () =>
      this.thread.ask({ kind: 'version-matrix', library, suites, ...(entries ? { entries } : {}) }),
    );
    return { matrix: value as VersionMatrix, computedMs: ms, fromCache };
  }

  /**
   * The stored source of an admin-added target (docs/libraries-screen.md), which the thread resolves
   * on first use; its row id is part of the answer's key, so a source removed and added again under
   * the same name is computed afresh.
   */
  private async addedSource(name: string) {
    const holder = await readyTargetSourceOf(this.dataSource.manager, name);
    return holder ? { id: holder.id, source: holder.source } : undefined;
  }

  /** Ends the findings threads. */
  close(): Promise<void> {
    return this.thread.close();
  }

  private async kept<T>(key: string, compute: () => Promise<T>): Promise<Timed<T> & { fromCache: boolean }> {
    const fromCache = this.cache.has(key);
    const timed = (await this.cache.get(key, async () => {
      const started = performance.now();
      const value = await compute();
      return { value, ms: Math.round(performance.now() - started) };
    })) as Timed<T>;
    return { ...timed, fromCache };
  }

  /** Discovery reads every installed package.json and starts Python once (~20 ms), so it runs once per library. */
  private versionsOf(library: string): TargetDescriptor[] {
    let known = this.versionsByLibrary.get(library);
    if (!known) {
      known = libraryVersions(library);
      // Only names that exist are remembered, so made-up names cannot grow the map.
      if (known.length > 0) this.versionsByLibrary.set(library, known);
    }
    return known;
  }
}

function unknownFunction(field: string, label: string): never {
  throw new InputError([
    {
      field,
      rule: `is not a function the fingerprint knows ("${label}"); known: ${FINGERPRINT_FUNCTIONS.map((f) => f.label).join(', ')}`,
    },
  ]);
}
