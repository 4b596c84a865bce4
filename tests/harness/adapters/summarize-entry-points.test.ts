import type { EntryPointFinding } from '../../../harness/adapters/entry-point-finding';
import { summarizeEntryPoints } from '../../../harness/adapters/summarize-entry-points';

const finding = (
  way: string,
  input: [string, string],
  arrived: [string, string] | null,
  error?: string,
): EntryPointFinding => ({
  target: 'lib@1.0.0',
  way,
  input,
  arrived,
  intact: arrived !== null && arrived[0] === input[0] && arrived[1] === input[1],
  ...(error ? { error } : {}),
});

describe('summarizeEntryPoints', () => {
  it('gives one line per target and way, intact only when every input arrived intact, listing the losses', () => {
    const summary = summarizeEntryPoints([
      finding('constructor', ['0', '-0'], ['0', '-0']),
      finding('string', ['0', '-0'], ['0', '0']),
      finding('constructor', ['-0', '0'], ['-0', '0']),
      finding('string', ['-0', '0'], null, 'bad string'),
    ]);
    expect(summary).toEqual([
      { target: 'lib@1.0.0', way: 'constructor', intact: true, lost: [] },
      { target: 'lib@1.0.0', way: 'string', intact: false, lost: ['0 -0 → 0 0', '-0 0 → error: bad string'] },
    ]);
  });

  it('keeps targets apart when they share a way name', () => {
    const a = finding('constructor', ['0', '-0'], ['0', '0']);
    const b = { ...finding('constructor', ['0', '-0'], ['0', '-0']), target: 'lib@2.0.0' };
    expect(summarizeEntryPoints([a, b]).map((s) => [s.target, s.intact])).toEqual([
      ['lib@1.0.0', false],
      ['lib@2.0.0', true],
    ]);
  });
});
