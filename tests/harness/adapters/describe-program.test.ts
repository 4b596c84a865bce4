import path from 'node:path';
import { describeProgram } from '../../../harness/adapters/describe-program';

const ROOT = path.join(__dirname, '..', '..', '..');

describe('describeProgram', () => {
  it('names the target from describe and keeps the program with its working folder made absolute', async () => {
    const source = {
      kind: 'program' as const,
      command: ['/usr/bin/python3', 'broken_adapter.py'],
      cwd: 'tests/fixtures/adapter-check',
      timeLimitMs: 2000,
    };
    const descriptor = await describeProgram(source, ROOT);
    expect(descriptor.name).toBe('broken@0.0.1');
    expect(descriptor.program).toEqual({ ...source, cwd: path.join(ROOT, 'tests', 'fixtures', 'adapter-check') });
  });
});
