import type { SubjectExpr } from '../expressions/subject-expr';

/** The library operations evaluating a subject needs (evaluate-on-target.ts), each once. */
export function subjectOps(expr: SubjectExpr): string[] {
  const ops = new Set<string>();
  const walk = (e: SubjectExpr): void => {
    switch (e.kind) {
      case 'z':
      case 'const':
        return;
      case 'neg':
        ops.add('neg');
        return walk(e.a);
      case 'add':
      case 'sub':
      case 'mul':
      case 'div':
        ops.add(e.kind);
        walk(e.a);
        return walk(e.b);
      case 'power':
        ops.add('pow');
        return walk(e.base);
      case 'complexPower':
        ops.add('pow');
        walk(e.base);
        return walk(e.exponent);
      case 'nthroot':
        ops.add('nthroot');
        return walk(e.arg);
      case 'call':
        ops.add(e.fn);
        return walk(e.arg);
    }
  };
  walk(expr);
  return [...ops];
}
