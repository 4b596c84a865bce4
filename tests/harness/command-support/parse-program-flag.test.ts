import { BadInput } from '../../../harness/command-support/bad-input';
import { parseProgramFlag } from '../../../harness/command-support/parse-program-flag';

describe('parseProgramFlag', () => {
  it('splits a command line as every command does, quotes and backslashes kept literal, nothing expanded', () => {
    expect(parseProgramFlag(`  python3 'my adapter.py' "a \\"b\\" c" d\\ e $HOME * `).command).toEqual([
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

  it('refuses an empty command, an open quote, an empty word and unstorable characters, naming the flag and the word', () => {
    expect(() => parseProgramFlag('   ')).toThrow(BadInput);
    expect(() => parseProgramFlag("python3 'adapter.py")).toThrow(/^--program: unclosed '/);
    expect(() => parseProgramFlag("python3 ''")).toThrow(
      new BadInput("--program python3 '': command[1]: must not be empty"),
    );
    expect(() => parseProgramFlag('python3 a\u0007b')).toThrow(
      /^--program python3 a\u0007b: command\[1\]: must not contain control characters$/,
    );
    // NUL and a lone surrogate get the one rule of every stored text (shared/schemas/text-schema.ts).
    expect(() => parseProgramFlag('python3 a\u0000b')).toThrow(/: command\[1\]: must not contain the NUL character/);
    expect(() => parseProgramFlag('python3 a\ud800')).toThrow(/: command\[1\]: must not contain the NUL character/);
    expect(() => parseProgramFlag('python3', 50)).toThrow(/^--time-limit: /);
  });
});
