import { execFileSync } from 'node:child_process';
import path from 'node:path';

const FIXTURE = path.join(__dirname, 'fixtures', 'loaded-libraries.ts');

/** The math packages in a fresh Node process's require.cache after using `target` (or nothing). */
function loadedAfter(target?: string): string[] {
  const out = execFileSync(process.execPath, ['--import', 'tsx', FIXTURE, ...(target ? [target] : [])], {
    encoding: 'utf8',
    timeout: 30_000,
  });
  return JSON.parse(out) as string[];
}

describe('lazy loading of target libraries', () => {
  it('loads no library to discover and list the targets', () => {
    expect(loadedAfter()).toEqual([]);
  });

  it('loads complex.js 2.4.1 and nothing else for a run against it: no mathjs', () => {
    expect(loadedAfter('complex.js@2.4.1')).toEqual(['complex.js-2.4.1']);
  });

  it('loads mathjs (and the complex.js it depends on) for a run against mathjs', () => {
    const loaded = loadedAfter('mathjs@14.9.1/complex');
    expect(loaded).toEqual(expect.arrayContaining(['mathjs-14.9.1', 'complex.js']));
    expect(loaded.filter((p) => p.startsWith('mathjs'))).toEqual(['mathjs-14.9.1']);
  });

  it('loads no JavaScript library for a run against cmath', () => {
    const cmath = execFileSync('/usr/bin/python3', ['-c', 'import platform; print(platform.python_version())'], {
      encoding: 'utf8',
    }).trim();
    expect(loadedAfter(`cmath@${cmath}`)).toEqual([]);
  });
});
