import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { GLYPHS } from '../../constants/glyphs';

const ROOT = path.join(__dirname, '..', '..');

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? sourceFiles(full) : /\.tsx?$/.test(name) ? [full] : [];
  });
}

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
    for (const file of ['app', 'components', 'client'].flatMap((d) => sourceFiles(path.join(ROOT, d)))) {
      const code = readFileSync(file, 'utf8')
        .replace(/\/\*[\s\S]*?\*\//g, '')
        .replace(/(^|[^:'"`])\/\/.*$/gm, '$1');
      for (const ch of new Set(code))
        if (ch.codePointAt(0)! > 0x7e && SIGN.test(ch) && !declared.has(ch))
          undeclared.push(`${path.relative(ROOT, file)}: ${ch}`);
    }
    expect(undeclared).toEqual([]);
  });
});
