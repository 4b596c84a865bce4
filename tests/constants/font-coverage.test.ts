import { readFileSync } from 'node:fs';
import path from 'node:path';
import { sourceFiles } from '../setup/source-files';

const ROOT = path.join(__dirname, '..', '..');

/** The code points a TrueType font maps (its `cmap` table, formats 4 and 12: the ones IBM Plex ships). */
function mappedCodePoints(file: string): Set<number> {
  const font = readFileSync(file);
  const tables = font.readUInt16BE(4);
  let cmap = -1;
  for (let i = 0; i < tables; i += 1)
    if (font.toString('latin1', 12 + 16 * i, 16 + 16 * i) === 'cmap') cmap = font.readUInt32BE(12 + 16 * i + 8);
  const points = new Set<number>();
  const subtables = font.readUInt16BE(cmap + 2);
  for (let i = 0; i < subtables; i += 1) {
    const at = cmap + font.readUInt32BE(cmap + 4 + 8 * i + 4);
    const format = font.readUInt16BE(at);
    if (format === 4) {
      const segments = font.readUInt16BE(at + 6) / 2;
      for (let s = 0; s < segments; s += 1) {
        const end = font.readUInt16BE(at + 14 + 2 * s);
        const start = font.readUInt16BE(at + 16 + 2 * segments + 2 * s);
        for (let c = start; c <= end && c !== 0xffff; c += 1) points.add(c);
      }
    } else if (format === 12) {
      const groups = font.readUInt32BE(at + 12);
      for (let g = 0; g < groups; g += 1)
        for (let c = font.readUInt32BE(at + 16 + 12 * g); c <= font.readUInt32BE(at + 20 + 12 * g); c += 1)
          points.add(c);
    }
  }
  return points;
}

describe('the shipped fonts', () => {
  // Common practice: a character missing from the font falls back to whatever the device has,
  // or shows as an empty box. Everything the app can show must be in IBM Plex Sans or Mono.
  const fonts = [
    'ibm-plex-sans/400Regular/IBMPlexSans_400Regular.ttf',
    'ibm-plex-mono/400Regular/IBMPlexMono_400Regular.ttf',
  ];
  const covered = new Set(
    fonts.flatMap((f) => [...mappedCodePoints(path.join(ROOT, 'node_modules', '@expo-google-fonts', f))]),
  );

  it('map the letters and signs the checks rely on', () => {
    for (const ch of 'Az09×−…→✓◊∆•') expect(covered.has(ch.codePointAt(0)!)).toBe(true);
    expect(covered.has(0x2715)).toBe(false);
  });

  it('cover every character in the text of the screens and components (comments aside)', () => {
    const missing: string[] = [];
    for (const { file, code } of sourceFiles(['app', 'components', 'client', 'constants'])) {
      for (const ch of new Set(code)) {
        const cp = ch.codePointAt(0)!;
        if (cp > 0x7e && !covered.has(cp))
          missing.push(`${file}: ${ch} U+${cp.toString(16).toUpperCase().padStart(4, '0')}`);
      }
    }
    expect(missing).toEqual([]);
  });
});
