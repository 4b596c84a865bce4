import type { WireComplex } from '../../../../shared/wire-complex';

/** A wire complex number from parts written as numbers or strings. */
export const c = (re: string | number, im: string | number = 0): WireComplex => ({ re: String(re), im: String(im) });
