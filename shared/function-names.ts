/**
 * The names of the maths functions a subject may call, in the catalogue's order: a light list
 * (no reference engine behind it) for the subject parser and anything the web app shows. The
 * full entries are in harness/catalogue/function-catalogue.ts, keyed by exactly these names.
 */
export const FUNCTION_NAMES = [
  'sqrt',
  'log',
  'cbrt',
  'nthroot',
  'pow',
  'exp',
  'asin',
  'acos',
  'atan',
  'asinh',
  'acosh',
  'atanh',
  'acot',
  'asec',
  'acsc',
  'acoth',
  'asech',
  'acsch',
] as const;

export type FunctionName = (typeof FUNCTION_NAMES)[number];
