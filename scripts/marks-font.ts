import opentype from 'opentype.js';

const UNITS = 1000;
const ASCENDER = 1025;
const DESCENDER = -275;
const ADVANCE = 912;
/** Half the stroke: heavier than Plex Regular's ~80-unit stems, so it reads as a mark, not a letter. */
const HALF = 62;

type Point = readonly [number, number];

/** The outline of a two-segment stroke a → v → b with square ends and a mitred corner at v, counter-clockwise. */
function strokeOutline(a: Point, v: Point, b: Point, half: number): Point[] {
  const unit = (p: Point, q: Point): Point => {
    const len = Math.hypot(q[0] - p[0], q[1] - p[1]);
    return [(q[0] - p[0]) / len, (q[1] - p[1]) / len];
  };
  const u1 = unit(a, v);
  const u2 = unit(v, b);
  const n1: Point = [-u1[1], u1[0]];
  const n2: Point = [-u2[1], u2[0]];
  // Where the offset lines of the two segments meet, on each side.
  const meet = (side: 1 | -1): Point => {
    const p: Point = [v[0] + side * half * n1[0], v[1] + side * half * n1[1]];
    const q: Point = [v[0] + side * half * n2[0], v[1] + side * half * n2[1]];
    const cross = u1[0] * u2[1] - u1[1] * u2[0];
    const t = ((q[0] - p[0]) * u2[1] - (q[1] - p[1]) * u2[0]) / cross;
    return [p[0] + t * u1[0], p[1] + t * u1[1]];
  };
  const off = (p: Point, n: Point, side: 1 | -1): Point => [p[0] + side * half * n[0], p[1] + side * half * n[1]];
  return [off(a, n1, -1), meet(-1), off(b, n2, -1), off(b, n2, 1), meet(1), off(a, n1, 1)];
}

/**
 * Our check-mark font: one glyph for U+2713. IBM Plex draws ✓ almost exactly like √ (seen side
 * by side at 40 px), which in a product about square roots reads "√ pass". The app puts this font
 * first in every family on the web with `unicode-range: U+2713` (client/install-marks-font.ts),
 * so only ✓ comes from it. Metrics are IBM Plex Sans's (1000 units, ascender 1025, descender
 * −275, ✓ 912 wide), so lines and widths do not move. `npm run make:marks-font` writes it to
 * `assets/fonts/sheetkeeper-marks.ttf`; tests/constants/marks-font.test.ts compares the two.
 */
export function marksFont(): opentype.Font {
  const outline = strokeOutline([170, 400], [370, 150], [770, 690], HALF);
  const check = new opentype.Path();
  outline.forEach(([x, y], i) =>
    i === 0 ? check.moveTo(Math.round(x), Math.round(y)) : check.lineTo(Math.round(x), Math.round(y)),
  );
  check.close();
  return new opentype.Font({
    familyName: 'SheetkeeperMarks',
    styleName: 'Regular',
    unitsPerEm: UNITS,
    ascender: ASCENDER,
    descender: DESCENDER,
    glyphs: [
      new opentype.Glyph({ name: '.notdef', advanceWidth: 600, path: new opentype.Path() }),
      new opentype.Glyph({ name: 'checkmark', unicode: 0x2713, advanceWidth: ADVANCE, path: check }),
    ],
  });
}
