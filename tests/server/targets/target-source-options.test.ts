import path from 'node:path';
import { PROJECT_ROOT } from '../../../server/config';
import { targetSourceOptions } from '../../../server/targets/target-source-options';

describe('targetSourceOptions', () => {
  const saved = process.env.SHEETKEEPER_CACHE_DIR;
  afterEach(() => {
    if (saved === undefined) delete process.env.SHEETKEEPER_CACHE_DIR;
    else process.env.SHEETKEEPER_CACHE_DIR = saved;
  });

  it('installs into SHEETKEEPER_CACHE_DIR when no folder is given, as the server config does (the findings threads pass none)', () => {
    process.env.SHEETKEEPER_CACHE_DIR = '/var/tmp/sheetkeeper-elsewhere';
    expect(targetSourceOptions()).toEqual({ baseDir: PROJECT_ROOT, cacheDir: '/var/tmp/sheetkeeper-elsewhere' });
  });

  it("falls back to the project's .data/target-cache", () => {
    delete process.env.SHEETKEEPER_CACHE_DIR;
    expect(targetSourceOptions().cacheDir).toBe(path.join(PROJECT_ROOT, '.data', 'target-cache'));
  });
});
