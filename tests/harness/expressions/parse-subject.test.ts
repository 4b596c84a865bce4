import { evaluateSubject } from '../../../harness/expressions/evaluate-subject';
import { parseSubject } from '../../../harness/expressions/parse-subject';
import { SUBJECT_LIMITS } from '../../../harness/expressions/subject-limits';
import { BigComplex } from '../../../harness/reference/complex/big-complex';
import { BigFloat } from '../../../harness/reference/numbers/big-float';

describe('parseSubject', () => {
  it('keeps a rational exponent exact: pow(z, 2/5) has exponent 2/5, not 0.4', () => {
    const e = parseSubject('pow(z, 2/5) * exp(z)');
    expect(e.kind === 'mul' && e.a.kind === 'power' && e.a.exponent.toString()).toBe('2/5');
  });

  it.each([
    ['sin(z)', 'the function "sin" (not in the catalogue) is not allowed in a subject (at "sin(z)")'],
    ['x + 1', 'the symbol "x" (only z and i are known) is not allowed in a subject (at "x")'],
    ['z[1]', 'a AccessorNode is not allowed in a subject (at "z[1]")'],
    ['a = 1', 'a AssignmentNode is not allowed in a subject (at "a = 1")'],
    [
      'z ^ z',
      'a power whose exponent is not an integer or rational constant (use pow(base, w)) is not allowed in a subject (at "z ^ z")',
    ],
    ['nthroot(z, 2.5)', 'nthroot needs a non-zero integer degree of at most 1000 (at "nthroot(z, 2.5)")'],
    ['sqrt(z, 2)', 'sqrt takes 1 argument, got 2 (at "sqrt(z, 2)")'],
    ['sqrt(z', 'syntax error: Parenthesis ) expected (char 7)'],
    ['z > 1', 'the operator ">" is not allowed in a subject (at "z > 1")'],
  ])('refuses %s, saying what and where', (text, message) => {
    expect(() => parseSubject(text)).toThrow(message);
  });

  it('refuses subjects over the length, depth and node limits', () => {
    expect(() => parseSubject('z+'.repeat(250) + 'z')).toThrow(`the limit is ${SUBJECT_LIMITS.length}`);
    expect(() => parseSubject('sqrt('.repeat(30) + 'z' + ')'.repeat(30))).toThrow(
      `nested more than ${SUBJECT_LIMITS.depth} deep`,
    );
    expect(() => parseSubject(Array.from({ length: 120 }, () => 'z').join('*'))).toThrow(
      `the limit is ${SUBJECT_LIMITS.nodes}`,
    );
  });
});

describe('evaluateSubject', () => {
  const at = (text: string, x: number, y: number) =>
    evaluateSubject(parseSubject(text), BigComplex.fromDoubles(x, y), 'signed-zero', { double: true, digits: 40 });

  it('keeps IEEE zero signs through z²: sqrt(z^2 - 1) at −0.5 + 0i is −0.866…i (z² = 0.25 − 0i)', () => {
    expect(at('sqrt(z^2 - 1)', -0.5, 0).double).toEqual([0, -0.8660254037844386]);
    expect(at('sqrt(z^2 - 1)', 0.5, 0).double).toEqual([0, 0.8660254037844386]);
  });

  it('returns x + x²/2 for exp(z) − 1 at the double x nearest 1e−20, settling the cancellation by raising precision', () => {
    const r = at('exp(z) - 1', 1e-20, 0);
    expect(r.double[0]).toBe(1e-20);
    // e^x − 1 = x + x²/2 + x³/6 + … (DLMF 4.2.19); with x ≈ 1e−20, x³/6 ≈ 2e−61 is below the 20th
    // digit but x²/2 ≈ 5e−41 is not. A naive exp(x) − 1 at 40 digits would have kept only noise.
    const x = BigFloat.fromDouble(1e-20);
    expect(r.approximation.re.toDecimal(20)).toBe(x.add(x.mul(x).scale(-1)).toDecimal(20));
    expect(r.approximation.re.toDecimal(20)).not.toBe(x.toDecimal(20));
  });
});
