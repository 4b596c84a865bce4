import path from 'node:path';
import opentype from 'opentype.js';
import { marksFont } from '../../scripts/marks-font';

const ROOT = path.resolve(__dirname, '..', '..');
const committed = opentype.loadSync(path.join(ROOT, 'assets', 'fonts', 'sheetkeeper-marks.ttf'));
const plex = opentype.loadSync(
  path.join(ROOT, 'node_modules', '@expo-google-fonts', 'ibm-plex-sans', '400Regular', 'IBMPlexSans_400Regular.ttf'),
);
const mapped = (font: opentype.Font) =>
  Object.keys((font.tables.cmap as unknown as { glyphIndexMap: Record<string, number> }).glyphIndexMap).map(Number);

describe('the check-mark font', () => {
  it('maps U+2713 and nothing else, so every other character still comes from IBM Plex', () => {
    expect(mapped(committed)).toEqual([0x2713]);
  });

  it('has IBM Plex Sans’s metrics and ✓ width, so lines and widths do not move when it loads', () => {
    expect([committed.unitsPerEm, committed.ascender, committed.descender]).toEqual([
      plex.unitsPerEm,
      plex.ascender,
      plex.descender,
    ]);
    expect(committed.charToGlyph('✓').advanceWidth).toBe(plex.charToGlyph('✓').advanceWidth);
  });

  it('draws a check with its corner low and its right arm high, unlike IBM Plex’s √', () => {
    const glyph = committed.charToGlyph('✓');
    const box = glyph.getBoundingBox();
    expect(box.y1).toBeGreaterThanOrEqual(0);
    // Font units, y up: the lowest point sits left of the middle, the highest at the right edge.
    const points = glyph.path.commands.flatMap((c) => ('x' in c ? [{ x: c.x, y: c.y }] : []));
    const lowest = points.reduce((a, b) => (b.y < a.y ? b : a));
    const highest = points.reduce((a, b) => (b.y > a.y ? b : a));
    expect(lowest.x).toBeLessThan(glyph.advanceWidth! / 2);
    expect(highest.x).toBeGreaterThan(0.75 * glyph.advanceWidth!);
    expect(box.y2).toBeLessThanOrEqual(plex.charToGlyph('H').getBoundingBox().y2 + 40);
    // The outline differs from Plex's own ✓ and √ (which are alike to within a few units).
    const outline = (font: opentype.Font, ch: string) => font.charToGlyph(ch).getPath(0, 0, 1000).toPathData(0);
    expect(outline(committed, '✓')).not.toBe(outline(plex, '✓'));
    expect(outline(committed, '✓')).not.toBe(outline(plex, '√'));
  });

  it('is the font scripts/marks-font.ts makes (run `npm run make:marks-font` after changing it)', () => {
    const made = marksFont();
    const glyph = (font: opentype.Font) => {
      const g = font.charToGlyph('✓');
      return { advance: g.advanceWidth, path: g.getPath(0, 0, 1000).toPathData(0) };
    };
    expect(glyph(committed)).toEqual(glyph(made));
  });
});
