import { z } from 'zod';

/**
 * The rule every text field states when it holds a character that cannot be stored: PostgreSQL
 * refuses U+0000 in `text` and `jsonb`, and a lone UTF-16 surrogate in `jsonb` (JSON.stringify
 * writes it as `\ud800`, which `jsonb` rejects); in `text` it silently became U+FFFD.
 */
export const STORABLE_TEXT_RULE =
  'must not contain the NUL character (U+0000) or a broken character (an unpaired UTF-16 surrogate)';

/** True when `s` has no U+0000 and every UTF-16 surrogate is half of a pair. */
function isStorable(s: string): boolean {
  for (let i = 0; i < s.length; i += 1) {
    const c = s.charCodeAt(i);
    if (c === 0) return false;
    if (c >= 0xd800 && c <= 0xdbff) {
      const next = s.charCodeAt(i + 1);
      if (!(next >= 0xdc00 && next <= 0xdfff)) return false;
      i += 1;
    } else if (c >= 0xdc00 && c <= 0xdfff) return false;
  }
  return true;
}

/**
 * The one string schema of every text input (bodies, path and query parameters, the forms): a
 * string that PostgreSQL can store and JSON can carry. Build every text field from it
 * (`textSchema('is required').trim().max(80)`), never from `z.string()`;
 * `tests/shared/schemas/text-schema.test.ts` fails on a bare `z.string(` in `shared/schemas/`.
 * The check aborts, so a field with a NUL names this rule alone.
 */
export function textSchema(typeError = 'must be text') {
  return z.string({ error: typeError }).refine(isStorable, { error: STORABLE_TEXT_RULE, abort: true });
}
