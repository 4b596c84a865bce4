import { STORABLE_TEXT_RULE } from '../../../shared/schemas/text-schema';
import { uploadFileName } from '../../../shared/schemas/upload-file-name';

const rule = (name: string) => {
  const checked = uploadFileName.safeParse(name);
  return checked.success ? null : checked.error.issues[0]!.message;
};

describe('uploadFileName', () => {
  it('accepts ordinary names up to 200 characters, accents and astral characters included', () => {
    expect(rule('sqrt-principal-sz.json')).toBeNull();
    expect(rule('réf ✓ 𝑧.csv')).toBeNull();
    expect(rule(`${'a'.repeat(195)}.json`)).toBeNull();
  });

  it('refuses an empty name and one over 200 characters', () => {
    expect(rule('')).toBe('is required');
    expect(rule(`${'a'.repeat(196)}.json`)).toBe('must be at most 200 characters');
  });

  it('refuses NUL with the rule every text field shares, and other C0 and C1 controls and DEL', () => {
    expect(rule('a\u0000b.json')).toBe(STORABLE_TEXT_RULE);
    for (const c of ['\u0007', '\t', '\n', '\u007f', '\u0085'])
      expect([JSON.stringify(c), rule(`a${c}b.json`)]).toEqual([
        JSON.stringify(c),
        'must not contain control characters',
      ]);
  });

  it('refuses a lone high or low surrogate but not a pair', () => {
    expect(rule('a\ud835.json')).toBe(STORABLE_TEXT_RULE);
    expect(rule('a\udc00.json')).toBe(STORABLE_TEXT_RULE);
    expect(rule('\ud835\udc67.json')).toBeNull();
  });
});
