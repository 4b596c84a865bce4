import { FUNCTION_ARITY } from '../../shared/function-arity';

/**
 * The operations a library target is asked for and how many complex arguments each takes: the
 * catalogue's functions (shared/function-arity.ts; nthroot's second argument is the integer n as
 * n + 0i) and the arithmetic subjects are built with.
 */
export const OP_ARITY: Readonly<Record<string, number>> = {
  ...FUNCTION_ARITY,
  add: 2,
  sub: 2,
  mul: 2,
  div: 2,
  neg: 1,
};
