import { splitCommandLine } from '../../../harness/command-support/split-command-line';

describe('splitCommandLine', () => {
  it('splits on blanks and keeps quoted words whole, as a POSIX shell splits words', () => {
    expect(splitCommandLine('python3  adapter.py\t--fast')).toEqual(['python3', 'adapter.py', '--fast']);
    expect(splitCommandLine(`julia 'my adapter.jl' "a \\"b\\" \\\\ c" x\\ y`)).toEqual([
      'julia',
      'my adapter.jl',
      'a "b" \\ c',
      'x y',
    ]);
    expect(splitCommandLine(`run '' ""`)).toEqual(['run', '', '']);
    expect(splitCommandLine(`a'b'"c"d`)).toEqual(['abcd']);
  });

  it('passes variables, globs, pipes and commas through as written, since no shell runs the program', () => {
    expect(splitCommandLine('prog $HOME *.py | tee a,b')).toEqual(['prog', '$HOME', '*.py', '|', 'tee', 'a,b']);
  });

  it('refuses an unclosed quote and an empty command line, naming the flag', () => {
    expect(() => splitCommandLine(`prog 'open`)).toThrow(/^--program: unclosed '/);
    expect(() => splitCommandLine('prog "open')).toThrow(/^--program: unclosed "/);
    expect(() => splitCommandLine('   ')).toThrow(/^--program: needs a command/);
  });
});
