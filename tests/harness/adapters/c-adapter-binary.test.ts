import { execFile, spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { cAdapterBinary } from '../../../harness/adapters/c-adapter-binary';
import { C_ADAPTER_SOURCE, cComplexTarget } from '../../../harness/adapters/c-complex-target';

const GCC = '/usr/bin/gcc';
const BUILDER = path.join(__dirname, 'fixtures', 'build-c-adapter.ts');

describe('cAdapterBinary', () => {
  let folder: string;
  beforeEach(() => {
    folder = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-c-adapter-'));
  });
  afterEach(() => {
    rmSync(folder, { recursive: true, force: true });
  });

  it('compiles the adapter once and reuses the cached binary for the same source and compiler', async () => {
    const first = await cAdapterBinary({ source: C_ADAPTER_SOURCE, compiler: GCC, folder });
    const built = statSync(first);
    const second = await cAdapterBinary({ source: C_ADAPTER_SOURCE, compiler: GCC, folder });
    expect(second).toBe(first);
    // The same file, not a rebuild: same inode and modification time, and no compiler run.
    expect([statSync(second).ino, statSync(second).mtimeMs]).toEqual([built.ino, built.mtimeMs]);
    expect(readdirSync(folder)).toEqual([path.basename(first)]);
  });

  it('ends with one complete binary and no temporary files when two processes build it at once', async () => {
    // Two Node processes, each running gcc to a temporary name and renaming it onto the final one.
    const build = () =>
      new Promise<string>((resolve, reject) => {
        execFile(process.execPath, ['--import', 'tsx', BUILDER, folder], { timeout: 60_000 }, (e, out, err) =>
          e ? reject(new Error(`${e.message}: ${err}`)) : resolve(out),
        );
      });
    const [a, b] = await Promise.all([build(), build()]);
    expect(a).toBe(b);
    expect(readdirSync(folder)).toEqual([path.basename(a)]);
    // The binary left is complete: it runs and answers describe.
    const run = spawnSync(a, [], { input: '{"id": 1, "op": "describe", "args": []}\n', encoding: 'utf8' });
    expect(JSON.parse(run.stdout)).toMatchObject({ id: 1, library: 'glibc' });
  }, 60_000);

  it('never hands out a binary still being written: a build started meanwhile waits for a complete one', async () => {
    // A stand-in compiler that writes its output in two halves 400 ms apart. Written in place, the
    // second build would find the first half under the final name and run it.
    const compiler = path.join(folder, 'slow-cc');
    writeFileSync(
      compiler,
      [
        '#!/bin/sh',
        'if [ "$1" = --version ]; then echo "slow-cc 1"; exit 0; fi',
        'while [ "$1" != -o ]; do shift; done',
        'printf "#!/bin/sh\\n" > "$2"; chmod +x "$2"; sleep 0.4; printf "echo complete\\n" >> "$2"',
        '',
      ].join('\n'),
      { mode: 0o755 },
    );
    const cache = path.join(folder, 'cache');
    const first = cAdapterBinary({ source: C_ADAPTER_SOURCE, compiler, folder: cache });
    await new Promise((resolve) => setTimeout(resolve, 150));
    const second = await cAdapterBinary({ source: C_ADAPTER_SOURCE, compiler, folder: cache });
    expect(readFileSync(second, 'utf8')).toBe('#!/bin/sh\necho complete\n');
    expect(await first).toBe(second);
  });

  it('builds a different binary for a different source', async () => {
    const edited = path.join(folder, 'edited.c');
    writeFileSync(edited, 'int main(void) { return 0; }\n');
    const original = await cAdapterBinary({ source: C_ADAPTER_SOURCE, compiler: GCC, folder });
    const other = await cAdapterBinary({ source: edited, compiler: GCC, folder });
    expect(other).not.toBe(original);
  });

  it('rejects with the compiler message when the source does not compile, leaving nothing behind', async () => {
    const broken = path.join(folder, 'broken.c');
    writeFileSync(broken, 'int main(void) { return undeclared_name; }\n');
    const cache = path.join(folder, 'cache');
    await expect(cAdapterBinary({ source: broken, compiler: GCC, folder: cache })).rejects.toThrow(
      /^the C adapter did not compile \(\/usr\/bin\/gcc .*broken\.c\): .*'undeclared_name' undeclared/s,
    );
    expect(readdirSync(cache)).toEqual([]);
  });

  it('rejects naming the compiler when it does not run', async () => {
    await expect(cAdapterBinary({ source: C_ADAPTER_SOURCE, compiler: '/nonexistent/gcc', folder })).rejects.toThrow(
      /^the C compiler \/nonexistent\/gcc does not run/,
    );
  });
});

describe('cComplexTarget with a source that does not compile', () => {
  it('answers every call with the compile error instead of throwing, and still lists the catalogue operation', async () => {
    const folder = mkdtempSync(path.join(os.tmpdir(), 'sheetkeeper-c-broken-'));
    try {
      const broken = path.join(folder, 'broken.c');
      writeFileSync(broken, 'this is not C\n');
      const target = cComplexTarget({ library: 'glibc', version: '2.36', source: broken, cache: folder });
      expect(target.processId()).toBeNull();
      expect(await target.supports('sqrt')).toBe(true);
      const results = await target.evaluate('sqrt', [[[4, 0]], [[-4, 0]]]);
      expect(results).toEqual([
        { error: expect.stringMatching(/^the C adapter did not compile .*error:/s) },
        { error: expect.stringMatching(/^the C adapter did not compile .*error:/s) },
      ]);
      const raw = await target.request('describe', []);
      expect(raw).toEqual({ error: expect.stringMatching(/^the C adapter did not compile/) });
      await target.close();
    } finally {
      rmSync(folder, { recursive: true, force: true });
    }
  });
});
