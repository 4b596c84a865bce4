/**
 * One point of a path: the parameter t ∈ [0, 1] and z as two doubles whose zero
 * signs are deliberate (a ±0 part says which side of an axis the point belongs to).
 */
export interface PathPoint {
  t: number;
  z: { re: number; im: number };
  label?: string;
}
