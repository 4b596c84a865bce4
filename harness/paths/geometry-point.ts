import { geometryNumber } from './geometry-number';

/** Reads a point of path geometry into two doubles (see geometry-number.ts). */
export function geometryPoint(
  p: { re: number | string; im: number | string },
  what = 'point',
): { re: number; im: number } {
  return { re: geometryNumber(p.re, `${what}.re`), im: geometryNumber(p.im, `${what}.im`) };
}
