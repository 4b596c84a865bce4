import { parseRunArgs } from '../../../../harness/runner/commands/parse-run-args';

describe('parseRunArgs', () => {
  it('reads --slice-time-limit as the time limit of one evaluation', () => {
    const args = parseRunArgs(['--suite', 'a', '--target', 'b', '--slice-time-limit', '1500']);
    expect(args).toMatchObject({ suites: ['a'], targets: ['b'], sliceTimeLimitMs: 1500 });
  });

  it('still reads the older spelling --shard-time-limit=MS, so CI scripts written with it keep working', () => {
    expect(parseRunArgs(['--suite=a', '--target=b', '--shard-time-limit=2500'])).toMatchObject({
      sliceTimeLimitMs: 2500,
    });
  });

  it('names the flag as written when its value is not a whole number', () => {
    expect(parseRunArgs(['--shard-time-limit', '0.5'])).toEqual({
      error: '--shard-time-limit must be a whole number of at least 1, got "0.5"',
    });
    expect(parseRunArgs(['--slice-time-limit'])).toEqual({ error: '--slice-time-limit needs a value' });
  });

  it('takes the summary format for a CI log and names the four formats when given another', () => {
    expect(parseRunArgs(['--suite', 'a', '--target', 'b', '--format', 'summary'])).toMatchObject({ format: 'summary' });
    expect(parseRunArgs(['--format', 'xml'])).toEqual({
      error: '--format must be table, json, junit or summary, got "xml"',
    });
  });
});
