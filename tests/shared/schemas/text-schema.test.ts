import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { STORABLE_TEXT_RULE, textSchema } from '../../../shared/schemas/text-schema';

const SEED = 20261204;
const text = textSchema();
const hasLoneSurrogate = (s: string) =>
  /[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/.test(s);

describe('textSchema', () => {
  it('accepts exactly the strings with no NUL and no lone surrogate', () => {
    // Law: accepted ⇔ no U+0000 and every surrogate paired, over arbitrary UTF-16 strings.
    fc.assert(
      fc.property(
        fc.string({ unit: 'binary', maxLength: 40 }),
        fc.string({ unit: 'grapheme', maxLength: 8 }),
        (a, b) => {
          const s = a + b;
          expect(text.safeParse(s).success).toBe(!s.includes('\u0000') && !hasLoneSurrogate(s));
        },
      ),
      { seed: SEED, numRuns: 2000, verbose: true },
    );
  });

  it('names its one rule for a NUL or a lone surrogate, and keeps pairs (emoji) and other controls', () => {
    for (const bad of ['\u0000', 'x\ud800', '\udc00x', '\ud800\ud800\udc00'])
      expect(text.safeParse(bad).error?.issues.map((i) => i.message)).toEqual([STORABLE_TEXT_RULE]);
    for (const good of ['', '😀', '\t\r\n\u0001', 'é\ud83d\ude00']) expect(text.safeParse(good).success).toBe(true);
  });

  it('is the only string schema in shared/schemas', () => {
    const dir = path.join(__dirname, '..', '..', '..', 'shared', 'schemas');
    const bare = readdirSync(dir)
      .filter((f) => f.endsWith('.ts') && f !== 'text-schema.ts')
      .filter((f) => /\bz\s*\.\s*string\s*\(/.test(readFileSync(path.join(dir, f), 'utf8')));
    expect(bare).toEqual([]);
  });
});
