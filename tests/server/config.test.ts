import { loadConfig } from '../../server/config';

describe('loadConfig: SHEETKEEPER_WORKER_TARGETS', () => {
  const saved = { ...process.env };
  const load = (value: string | undefined) => {
    process.env = { ...saved, DATABASE_URL: 'postgres://127.0.0.1:1/none', SESSION_SECRET: 'test-secret' };
    if (value === undefined) delete process.env.SHEETKEEPER_WORKER_TARGETS;
    else process.env.SHEETKEEPER_WORKER_TARGETS = value;
    return loadConfig();
  };
  afterEach(() => {
    process.env = saved;
  });

  it('leaves a worker every target it has when unset', () => {
    expect(load(undefined).workerTargets).toBeNull();
  });

  it('reads comma-separated names and prefixes, without the spaces around them', () => {
    expect(load(' complex.js@2.4 , mathjs@15.2.0/complex,,').workerTargets).toEqual([
      'complex.js@2.4',
      'mathjs@15.2.0/complex',
    ]);
  });

  it('refuses a setting that names no target, naming the variable', () => {
    expect(() => load(' , ')).toThrow(
      'SHEETKEEPER_WORKER_TARGETS names no target: give target names or name prefixes, comma-separated',
    );
  });
});
