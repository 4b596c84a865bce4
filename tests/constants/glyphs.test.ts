import { GLYPHS } from '../../constants/glyphs';
import { sourceFiles } from '../setup/source-files';

/**
 * A character a reader takes as a sign: a symbol outside ASCII (Unicode category S: arrows, marks,
 * maths), the bullet and the ellipsis. Letters, digits, ASCII and typographic punctuation (quotes,
 * dashes, the middle dot) are words' business, not glyphs.
 */
const SIGN = /[\p{S}•…–]/u;

describe('the glyphs', () => {
  it('give each glyph one meaning: no two meanings share a glyph', () => {
    const byGlyph = new Map<string, string[]>();
    for (const [name, { glyph }] of Object.entries(GLYPHS)) byGlyph.set(glyph, [...(byGlyph.get(glyph) ?? []), name]);
    expect([...byGlyph].filter(([, names]) => names.length > 1)).toEqual([]);
  });

  it('declare every sign the screens, components and client show (comments aside)', () => {
    const declared = new Set<string>(Object.values(GLYPHS).map((g) => g.glyph));
    const undeclared: string[] = [];
    for (const { file, code } of sourceFiles(['app', 'components', 'client']))
      for (const ch of new Set(code))
        if (ch.codePointAt(0)! > 0x7e && SIGN.test(ch) && !declared.has(ch)) undeclared.push(`${file}: ${ch}`);
    expect(undeclared).toEqual([]);
  });
});
