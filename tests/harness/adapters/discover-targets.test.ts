import { mkdtempSync, readdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { C_COMPLEX_ENTRIES } from '../../../harness/adapters/c-complex-entries';
import { discoverTargets } from '../../../harness/adapters/discover-targets';
import { NUMPY_ENTRIES } from '../../../harness/adapters/numpy-entries';
import { systemLibcVersion } from '../../../harness/adapters/system-libc-version';
import { listTargets } from '../../../harness/adapters/list-targets';

const ROOT = path.join(__dirname, '..', '..', '..');
const declaredVersion = (alias: string): string =>
  (JSON.parse(readFileSync(path.join(ROOT, 'node_modules', alias, 'package.json'), 'utf8')) as { version: string })
    .version;

describe('discoverTargets', () => {
  const targets = discoverTargets();

  it('finds at least five complex.js versions from 2.0.x to 2.4.3, including 2.4.1, 2.4.2 and 2.4.3', () => {
    const versions = targets.filter((t) => t.library === 'complex.js').map((t) => t.version);
    expect(versions.length).toBeGreaterThanOrEqual(5);
    expect(versions.some((v) => v.startsWith('2.0.'))).toBe(true);
    expect(versions).toEqual(expect.arrayContaining(['2.4.1', '2.4.2', '2.4.3']));
  });

  it('finds at least three mathjs versions over at least two majors, including 15.2.0', () => {
    const versions = [...new Set(targets.filter((t) => t.library === 'mathjs').map((t) => t.version))];
    expect(versions.length).toBeGreaterThanOrEqual(3);
    expect(new Set(versions.map((v) => v.split('.')[0])).size).toBeGreaterThanOrEqual(2);
    expect(versions).toContain('15.2.0');
  });

  it('takes each version from the installed package.json of its alias', () => {
    for (const t of targets.filter((x) => x.library === 'complex.js' || x.library === 'mathjs')) {
      expect(`${t.name} ${declaredVersion(t.settings.package as string)}`).toBe(`${t.name} ${t.version}`);
    }
  });

  it('gives every target a unique name', () => {
    expect(new Set(targets.map((t) => t.name)).size).toBe(targets.length);
  });

  it('opens every target on this Node and computes sqrt(4) = 2 with each', async () => {
    for (const descriptor of targets) {
      const target = descriptor.open();
      try {
        expect({ name: target.name, result: await target.evaluate('sqrt', [[[4, 0]]]) }).toEqual({
          name: target.name,
          result: [{ value: [2, 0] }],
        });
      } finally {
        await target.close();
      }
    }
  }, 60_000);

  it('lists only JavaScript Math when no library is installed and neither Python nor gcc runs', () => {
    const empty = discoverTargets(
      path.join(__dirname, 'fixtures', 'empty-project'),
      '/nonexistent/python3',
      '/nonexistent/gcc',
    );
    expect(empty.map((t) => t.library)).toEqual(['JavaScript Math']);
  });

  it('lists the system C library when gcc is there without compiling the adapter, and NumPy when Python has it', () => {
    const cache = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-discover-'));
    const before = process.env.SHEETKEEPER_CACHE_DIR;
    process.env.SHEETKEEPER_CACHE_DIR = cache;
    try {
      const found = discoverTargets();
      const libc = systemLibcVersion();
      expect(found.find((t) => t.library === libc.library)).toMatchObject({
        name: `${libc.library}@${libc.version}`,
        entries: C_COMPLEX_ENTRIES,
        settings: { protocol: 'stdio', language: 'C', compiler: '/usr/bin/gcc' },
      });
      expect(found.find((t) => t.library === 'numpy')).toMatchObject({ entries: NUMPY_ENTRIES });
      expect(readdirSync(cache)).toEqual([]);
    } finally {
      if (before === undefined) delete process.env.SHEETKEEPER_CACHE_DIR;
      else process.env.SHEETKEEPER_CACHE_DIR = before;
      rmSync(cache, { recursive: true, force: true });
    }
  });
});

describe('listTargets', () => {
  it('returns JSON-ready name, library, version, settings and entries for each target, the default entry first', () => {
    const listed = listTargets();
    expect(JSON.parse(JSON.stringify(listed))).toEqual(listed);
    expect(listed.find((t) => t.name === 'mathjs@15.2.0/number/predictable')).toEqual({
      name: 'mathjs@15.2.0/number/predictable',
      library: 'mathjs',
      version: '15.2.0',
      settings: { package: 'mathjs', entry: 'number', predictable: true, 'complex.js': declaredVersion('complex.js') },
      entries: expect.any(Array),
    });
    const entries = listed.find((t) => t.name === 'mathjs@15.2.0/number/predictable')?.entries ?? [];
    expect(entries.map((e) => [e.name, e.default])).toEqual([
      ['number', true],
      ['complex', false],
      ['object', false],
      ['string', false],
      ['parser', false],
    ]);
    expect(entries[0]?.carries).toEqual({ imaginaryPart: false, realZeroSign: true, imaginaryZeroSign: false });
    for (const t of listed) expect(t.entries?.filter((e) => e.default).length).toBe(1);
  });
});
