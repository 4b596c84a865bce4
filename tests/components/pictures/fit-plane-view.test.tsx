import fc from 'fast-check';
import { describePlaneScale } from '../../../components/pictures/describe-plane-scale';
import { FAR, fitPlaneView, NEAR, type PlaneFit } from '../../../components/pictures/fit-plane-view';
import { formatAxisRange } from '../../../components/pictures/format-axis-range';
import { logDistanceScale } from '../../../components/pictures/log-distance-scale';
import type { PlanePoint } from '../../../components/pictures/plane-picture';

const SQRT_CUT = {
  points: [
    { re: 0, im: 0 },
    { re: -1, im: 0 },
  ],
  toInfinity: true,
};
const inBox = (fit: PlaneFit, p: PlanePoint) => {
  const v = fit.project(p);
  return v.re >= fit.box.minRe && v.re <= fit.box.maxRe && v.im >= fit.box.minIm && v.im <= fit.box.maxIm;
};
const circle = (center: PlanePoint, radius: number, samples = 65): PlanePoint[] =>
  Array.from({ length: samples }, (_, k) => ({
    re: center.re + radius * Math.cos((2 * Math.PI * k) / (samples - 1)),
    im: center.im + radius * Math.sin((2 * Math.PI * k) / (samples - 1)),
  }));
const spread = (pts: PlanePoint[]) => {
  const res = pts.map((p) => p.re);
  const ims = pts.map((p) => p.im);
  return Math.max(Math.max(...res) - Math.min(...res), Math.max(...ims) - Math.min(...ims));
};

/** A coordinate from the subnormals to ±1e300, every decade about equally likely. */
const coordinate = fc
  .tuple(fc.integer({ min: -323, max: 300 }), fc.double({ min: 1, max: 9.99, noNaN: true }), fc.boolean())
  .map(([k, m, negative]) => (negative ? -1 : 1) * m * 10 ** k);
const planePoint = fc.record({ re: coordinate, im: coordinate });
/** A cluster: a centre and points at offsets of every scale from it, so one picture mixes 1e-300 and 1e6. */
const cluster = fc
  .tuple(planePoint, fc.array(fc.tuple(coordinate, coordinate), { minLength: 1, maxLength: 30 }))
  .map(([c, offsets]) => [c, ...offsets.map(([a, b]) => ({ re: c.re + a, im: c.im + b }))]);
const cut = fc
  .tuple(planePoint, planePoint, fc.boolean())
  .map(([a, b, toInfinity]) => ({ points: [a, b], toInfinity }));

describe('fitPlaneView', () => {
  it('keeps every point in view, at any mix of scales from 5e-324 to 1e300 (seed 6106)', () => {
    fc.assert(
      fc.property(
        cluster,
        fc.array(planePoint, { maxLength: 3 }),
        fc.array(cut, { maxLength: 2 }),
        (pts, bps, cuts) => {
          const fit = fitPlaneView({ points: pts, branchPoints: bps, cuts });
          for (const p of pts)
            if (!inBox(fit, p)) throw new Error(`(${p.re}, ${p.im}) is outside the ${fit.scale.kind} fit`);
        },
      ),
      { seed: 6106, numRuns: 3000 },
    );
  });

  it(`shows the nearest branch point whenever it lies within ${NEAR}× the path's size of the path (seed 6107)`, () => {
    fc.assert(
      fc.property(
        cluster.filter((pts) => spread(pts) > 0),
        fc.double({ min: 0, max: NEAR, noNaN: true }),
        fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
        fc.array(cut, { maxLength: 2 }),
        (pts, k, angle, cuts) => {
          const from = pts[pts.length - 1]!;
          const d = k * spread(pts);
          const b = { re: from.re + d * Math.cos(angle), im: from.im + d * Math.sin(angle) };
          const nearest = Math.min(...pts.map((p) => Math.hypot(p.re - b.re, p.im - b.im)));
          fc.pre(Number.isFinite(b.re) && Number.isFinite(b.im) && nearest <= NEAR * spread(pts));
          const fit = fitPlaneView({ points: pts, branchPoints: [b], cuts });
          if (!inBox(fit, b)) throw new Error(`branch point (${b.re}, ${b.im}) is outside the ${fit.scale.kind} fit`);
        },
      ),
      { seed: 6107, numRuns: 2000 },
    );
  });

  it('draws a nearer point nearer the centre on the log scale: the radius is increasing in distance (seed 6108)', () => {
    const distanceArb = fc.double({ min: 5e-324, max: 1e300, noNaN: true });
    fc.assert(
      fc.property(
        fc.integer({ min: -324, max: 299 }),
        fc.integer({ min: 1, max: 300 }),
        distanceArb,
        distanceArb,
        (lo, decades, r1, r2) => {
          const scale = logDistanceScale(lo, lo + decades);
          const [near, far] = r1 <= r2 ? [r1, r2] : [r2, r1];
          if (scale.radius(near) > scale.radius(far)) throw new Error(`${near} is drawn beyond ${far}`);
          if (far >= 2 * near && !(scale.radius(near) < scale.radius(far)))
            throw new Error(`${near} and ${far} are drawn at the same radius`);
          if (!(scale.radius(near) > 0)) throw new Error(`${near} > 0 is drawn at the centre`);
        },
      ),
      { seed: 6108, numRuns: 5000 },
    );
  });

  it('fits a straddle of the square root cut at −0.5 on a log scale of distance from the cut, the branch point 0 in view', () => {
    const offsets = [1e-3, 1e-9, 1e-300, 5e-324];
    // From the top down: +1e-3 … +5e-324, the cut itself, −5e-324 … −1e-3.
    const pts = [
      ...offsets.map((o) => ({ re: -0.5, im: o })),
      { re: -0.5, im: 0 },
      ...[...offsets].reverse().map((o) => ({ re: -0.5, im: -o })),
    ];
    const fit = fitPlaneView({ points: pts, branchPoints: [{ re: 0, im: 0 }], cuts: [SQRT_CUT], focus: pts[1] });
    expect(fit.scale).toMatchObject({ kind: 'log', centerIs: 'cut', center: { re: -0.5, im: 0 } });
    expect(inBox(fit, { re: 0, im: 0 })).toBe(true);
    // Every offset has its own height: the nine points are drawn top to bottom in their order, not as one dot.
    const heights = pts.map((p) => fit.project(p).im);
    expect(heights.every((h, i) => i === 0 || h < heights[i - 1]!)).toBe(true);
    // The cut is drawn through the centre and on past the picture's left edge.
    const line = fit.cutLine(SQRT_CUT);
    expect(line.some((v) => v.re === 0 && v.im === 0)).toBe(true);
    expect(Math.min(...line.map((v) => v.re))).toBeLessThan(fit.box.minRe);
    expect(describePlaneScale(fit, fit.box)).toMatch(/^distance from −0\.5 on the cut, log scale \(rings at .*1e−300/);
  });

  it.each([1e-3, 1e-310])('draws a circle of radius %p around its centre as a circle filling the picture', (radius) => {
    const pts = circle({ re: 0, im: 0 }, radius);
    const fit = fitPlaneView({ points: pts, branchPoints: [{ re: 0, im: 0 }], cuts: [SQRT_CUT], focus: pts[20] });
    expect(fit.scale.kind).toBe('linear');
    const centre = fit.project({ re: 0, im: 0 });
    const radii = pts.map((p) => Math.hypot(fit.project(p).re - centre.re, fit.project(p).im - centre.im));
    // Subnormal coordinates near 1e-310 keep ~44 bits: the drawn radius is the same to 1e-9.
    expect(Math.max(...radii) / Math.min(...radii)).toBeLessThan(1 + 1e-9);
    expect(Math.min(...radii)).toBeGreaterThan(0.8);
    expect(describePlaneScale(fit, fit.box)).toMatch(
      radius === 1e-3 ? /^Re −0\.00115 … 0\.00115/ : /^Re −1\.15e−310 … 1\.15e−310/,
    );
  });

  it('keeps the rest of a path apart when one point lies a million away', () => {
    const near = [
      { re: 0.1, im: 0.1 },
      { re: 0.2, im: 0 },
      { re: 0, im: 0.3 },
      { re: -0.2, im: -0.1 },
    ];
    const fit = fitPlaneView({
      points: [...near, { re: 1e6, im: 0 }],
      branchPoints: [{ re: 0, im: 0 }],
      cuts: [SQRT_CUT],
    });
    expect(fit.scale).toMatchObject({ kind: 'log', centerIs: 'branch point', center: { re: 0, im: 0 } });
    const drawn = near.map(fit.project);
    const width = fit.box.maxRe - fit.box.minRe;
    expect(spread(drawn) / width).toBeGreaterThan(0.1);
    expect(describePlaneScale(fit, fit.box)).toMatch(/^distance from the branch point 0, log scale/);
  });

  it(`lets the log scale reach a branch point ${FAR / 2}× the path's size away`, () => {
    const pts = [0.001, 1e-200].flatMap((o) => [
      { re: 5, im: o },
      { re: 5, im: -o },
    ]);
    const far = { re: 5 + (FAR / 2) * 0.002, im: 0 };
    const fit = fitPlaneView({
      points: pts,
      branchPoints: [far],
      cuts: [{ points: [far, { re: 0, im: 0 }], toInfinity: false }],
    });
    expect(fit.scale.kind).toBe('log');
    expect(inBox(fit, far)).toBe(true);
  });
});

describe('formatAxisRange', () => {
  it('gives two ends that differ, however narrow the axis', () => {
    expect(formatAxisRange(-0.5012, -0.4988)).toEqual(['−0.5012', '−0.4988']);
    expect(formatAxisRange(1e6 - 1e-3, 1e6 + 1e-3)).toEqual(['9.99999999e5', '1.000000001e6']);
    expect(formatAxisRange(-2, 2)).toEqual(['−2', '2']);
  });
});
