import { parseSubject } from '../../../../harness/expressions/parse-subject';
import { subjectProgram } from '../../../../harness/runner/evaluation/subject-program';

const texts = (subject: string): string[] =>
  subjectProgram(parseSubject(subject)).steps.flatMap((s) => (s.kind === 'op' ? [s.text] : []));

describe('subjectProgram', () => {
  it('writes each operation step as the library call it is, brackets only around operands that need them', () => {
    expect(texts('log(z^13)')).toEqual(['pow(z, 13)', 'log(pow(z, 13))']);
    expect(texts('sqrt(z^2 - 1)')).toEqual(['pow(z, 2)', 'pow(z, 2) - 1', 'sqrt(pow(z, 2) - 1)']);
    expect(texts('sqrt(z) - pow(z, 0.5)')).toEqual(['sqrt(z)', 'pow(z, 0.5)', 'sqrt(z) - pow(z, 0.5)']);
    expect(texts('-(z*z) + 2*z/(z-1)')).toEqual([
      'z * z',
      '-(z * z)',
      '2 * z',
      'z - 1',
      '(2 * z) / (z - 1)',
      '(-(z * z)) + ((2 * z) / (z - 1))',
    ]);
  });

  it('keeps on each operation step the sub-expression it computes, the whole subject last', () => {
    const expr = parseSubject('log(z^13)');
    const last = subjectProgram(expr).steps.at(-1)!;
    expect(last.kind === 'op' && last.node).toBe(expr);
  });
});
