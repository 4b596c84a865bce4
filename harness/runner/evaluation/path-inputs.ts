import type { PathPoint } from '../../paths/path-point';

/** The same points column-wise, with their t: the adapters and the check loop read these. */
const INPUTS = new WeakMap<PathPoint[], { re: Float64Array; im: Float64Array; t: number[] }>();

/** A path's points as columns of re, im and t, built once per points array. */
export function pathInputs(points: PathPoint[]): { re: Float64Array; im: Float64Array; t: number[] } {
  let inputs = INPUTS.get(points);
  if (!inputs) {
    const n = points.length;
    inputs = { re: new Float64Array(n), im: new Float64Array(n), t: new Array<number>(n) };
    for (let i = 0; i < n; i++) {
      inputs.re[i] = (points[i] as PathPoint).z.re;
      inputs.im[i] = (points[i] as PathPoint).z.im;
      inputs.t[i] = (points[i] as PathPoint).t;
    }
    INPUTS.set(points, inputs);
  }
  return inputs;
}
