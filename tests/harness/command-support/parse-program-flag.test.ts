import { BadInput } from '../../../harness/command-support/bad-input';
import { parseProgramFlag } from '../../../harness/command-support/parse-program-flag';

describe('parseProgramFlag', () => {
  it('splits a command into words as a shell does, quotes and backslashes kept literal, nothing expanded', () => {
    expect(parseProgramFlag('  /usr/bin/python3   adapter.py --flag ').command).toEqual([
      '/usr/bin/python3',
      'adapter.py',
      '--flag',
    ]);
    expect(parseProgramFlag(`python3 'my adapter.py' "a \\"b\\" c" d\\ e $HOME *`).command).toEqual([
      'python3',
      'my adapter.py',
      'a "b" c',
      'd e',
      '$HOME',
      '*',
    ]);
  });

  it('makes a program target source with the time limit given', () => {
    expect(parseProgramFlag('./adapter', 500)).toEqual({ kind: 'program', command: ['./adapter'], timeLimitMs: 500 });
  });

  it('refuses an empty command, an open quote and control characters, naming the flag', () => {
    expect(() => parseProgramFlag('   ')).toThrow(new BadInput('--program: names no command'));
    expect(() => parseProgramFlag("python3 'adapter.py")).toThrow(new BadInput("--program: a ' quote is not closed"));
    expect(() => parseProgramFlag('python3 "a\u0007b"')).toThrow(
      /^--program: word 2 must not contain control characters$/,
    );
    // NUL and a lone surrogate get the one rule of every stored text (shared/schemas/text-schema.ts).
    expect(() => parseProgramFlag('python3 "a\u0000b"')).toThrow(
      /^--program: word 2 must not contain the NUL character/,
    );
    expect(() => parseProgramFlag('python3 a\ud800')).toThrow(/^--program: word 2 must not contain the NUL character/);
    expect(() => parseProgramFlag("python3 ''")).toThrow(new BadInput('--program: word 2 is empty'));
    expect(() => parseProgramFlag('python3', 50)).toThrow(/^--time-limit: /);
  });
});
