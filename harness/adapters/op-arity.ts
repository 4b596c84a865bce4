/**
 * The operations of the catalogue (docs/vocabulary.md) and how many complex arguments each
 * takes. nthroot's second argument is the integer n as n + 0i.
 */
export const OP_ARITY: Readonly<Record<string, number>> = {
  sqrt: 1,
  cbrt: 1,
  nthroot: 2,
  pow: 2,
  exp: 1,
  log: 1,
  asin: 1,
  acos: 1,
  atan: 1,
  asinh: 1,
  acosh: 1,
  atanh: 1,
  acot: 1,
  asec: 1,
  acsc: 1,
  acoth: 1,
  asech: 1,
  acsch: 1,
  add: 2,
  sub: 2,
  mul: 2,
  div: 2,
  neg: 1,
};
