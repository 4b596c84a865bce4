/**
 * The maths functions a subject may call, each with how many complex arguments a library's
 * operation takes (nthroot's n arrives as n + 0i), in the catalogue's order. A light table (no
 * reference engine behind it) for the subject parser, the library adapters and anything the web
 * app shows; the full entries are in harness/catalogue/function-catalogue.ts, keyed by exactly
 * these names. Arities live here because the adapters need them before any value is computed:
 * loading the catalogue (and with it the reference engine) took 50–140 ms under tsx on the shared
 * 2-core machine (load average 13–17), loading op-arity.ts from this file 2–12 ms.
 */
export const FUNCTION_ARITY = {
  sqrt: 1,
  log: 1,
  cbrt: 1,
  nthroot: 2,
  pow: 2,
  exp: 1,
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
} as const satisfies Readonly<Record<string, 1 | 2>>;

export type FunctionName = keyof typeof FUNCTION_ARITY;
