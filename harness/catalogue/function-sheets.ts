import type { SheetFamily } from '../checks/sheet-family';

/**
 * Where a function's other values lie relative to its principal one (harness/checks/sheet-family.ts):
 * a `root` of a fixed degree (the power family with ν = 1/degree), a power whose family the
 * subject's `exponent` fixes, one of the `additive` families, or `none` (single-valued, as exp).
 */
export type FunctionSheets =
  | { kind: 'root'; degree: number }
  | { kind: 'exponent' }
  | { kind: 'additive'; family: Exclude<SheetFamily['kind'], 'power'> }
  | { kind: 'none' };
