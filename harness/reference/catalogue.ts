import { acos } from './functions/acos';
import { acosh } from './functions/acosh';
import { acot } from './functions/acot';
import { acoth } from './functions/acoth';
import { acsc } from './functions/acsc';
import { acsch } from './functions/acsch';
import { asec } from './functions/asec';
import { asech } from './functions/asech';
import { asin } from './functions/asin';
import { asinh } from './functions/asinh';
import { atan } from './functions/atan';
import { atanh } from './functions/atanh';
import type { CatalogueFunction } from './functions/catalogue-function';
import { exp } from './functions/exp';
import { log } from './functions/log';
import type { ReciprocalFunction } from './functions/reciprocal-function';
import { sqrt } from './functions/sqrt';

/**
 * Every function of the reference catalogue by name. Powers and roots (pow, cbrt,
 * nthroot) take an exponent and are listed as `power`.
 */
export const catalogue: Readonly<
  Record<
    string,
    { kind: 'plain'; fn: CatalogueFunction } | { kind: 'reciprocal'; fn: ReciprocalFunction } | { kind: 'power' }
  >
> = {
  sqrt: { kind: 'plain', fn: sqrt },
  exp: { kind: 'plain', fn: exp },
  log: { kind: 'plain', fn: log },
  asin: { kind: 'plain', fn: asin },
  acos: { kind: 'plain', fn: acos },
  atan: { kind: 'plain', fn: atan },
  asinh: { kind: 'plain', fn: asinh },
  acosh: { kind: 'plain', fn: acosh },
  atanh: { kind: 'plain', fn: atanh },
  acot: { kind: 'reciprocal', fn: acot },
  asec: { kind: 'reciprocal', fn: asec },
  acsc: { kind: 'reciprocal', fn: acsc },
  acoth: { kind: 'reciprocal', fn: acoth },
  asech: { kind: 'reciprocal', fn: asech },
  acsch: { kind: 'reciprocal', fn: acsch },
  pow: { kind: 'power' },
  cbrt: { kind: 'power' },
  nthroot: { kind: 'power' },
};
