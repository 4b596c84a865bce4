import type { WireComplex } from './wire-complex';
/**
 * Where one function of a target is discontinuous over a box, against where the reference
 * catalogue puts its cuts (docs/architecture.md, library findings). `observed` are the discontinuities found
 * between grid neighbours, merged into polylines; `expected` are the catalogue's cuts clipped
 * to the box, with the share of grid lines crossing them where a discontinuity was found.
 * `verdict` is `matches` when every observed discontinuity lies on an expected cut and every
 * expected cut was seen; `statement` says what that does and does not show.
 */
export interface CutMap {
  target: string;
  function: string;
  box: { min: WireComplex; max: WireComplex };
  columns: number;
  rows: number;
  verdict: 'matches' | 'differs';
  statement: string;
  observed: {
    /** The crossings of grid lines, in order along the segment. */
    points: WireComplex[];
    /** True when every crossing lies on an expected cut. */
    onExpectedCut: boolean;
  }[];
  expected: {
    label: string;
    from: WireComplex;
    to: WireComplex;
    /** Share of the grid lines crossing this cut inside the box where a discontinuity was found (null: the cut crosses none). */
    coverage: number | null;
    seen: boolean;
  }[];
  /** Grid points where the target gave no finite value (they take part in no neighbour test). */
  notFinite: number;
}
