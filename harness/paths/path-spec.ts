/**
 * A number of path geometry: a double, or a string (decimal, C hex float or p/q)
 * read as the nearest double (see geometry-number.ts).
 */
type GeometryNumber = number | string;

/** A point of path geometry. */
type GeometryPoint = { re: GeometryNumber; im: GeometryNumber };

/**
 * Which parameters to sample: `samples` evenly spaced values t = i/(samples − 1),
 * or explicit values `at` (each in [0, 1]). Exactly one of the two.
 */
type Sampling = { samples: number; at?: undefined } | { at: GeometryNumber[]; samples?: undefined };

/**
 * The description of a path (docs/vocabulary.md). Angles are in radians, or a rational
 * multiple of π written "pi", "-pi/2", "3pi/4", which is exact (see parse-turns.ts).
 */
export type PathSpec =
  | ({
      kind: 'circle';
      center: GeometryPoint;
      radius: GeometryNumber;
      startAngle: GeometryNumber;
      turns: GeometryNumber;
      direction: 'ccw' | 'cw';
    } & Sampling)
  | ({ kind: 'segment'; from: GeometryPoint; to: GeometryPoint } & Sampling)
  | ({ kind: 'polyline'; points: GeometryPoint[] } & Sampling)
  | {
      kind: 'straddle';
      /** A cut segment, or a ray from `from` towards `through` (through it and beyond). */
      cut:
        | { kind: 'segment'; from: GeometryPoint; to: GeometryPoint }
        | { kind: 'ray'; from: GeometryPoint; through: GeometryPoint };
      /**
       * Where along the cut to straddle: for a segment, fractions of its length in [0, 1];
       * for a ray, distances from its start (≥ 0).
       */
      along: GeometryNumber[];
      /** Distances from the cut, each put on both sides; default 1e-3, 1e-9, 1e-300, 5e-324. */
      offsets?: GeometryNumber[];
    }
  /** Exactly these points, once each, in order: t is the index over (count − 1), 0 for a single point. */
  | { kind: 'points'; points: GeometryPoint[] }
  | {
      kind: 'grid';
      min: GeometryPoint;
      max: GeometryPoint;
      /** Columns along the real axis and rows along the imaginary axis (each ≥ 2). */
      columns: number;
      rows: number;
      /** Emit a point with an exactly zero part twice, with +0 and with −0. */
      bothZeroSigns?: boolean;
    };
