import { parseArgs } from 'node:util';
import type { z } from 'zod';
import { BadInput } from './bad-input';

/**
 * Reads `--name value` flags (node:util parseArgs, strict: an unknown flag is an error) and
 * validates them with the command's one zod schema; anything wrong becomes {@link BadInput}
 * naming the flag and the rule.
 */
export function readFlags<T extends z.ZodType>(argv: readonly string[], names: readonly string[], schema: T): z.infer<T> {
  let values: Record<string, unknown>;
  try {
    const options = Object.fromEntries(names.map((n) => [n, { type: 'string' as const }]));
    values = parseArgs({ args: [...argv], options, strict: true, allowPositionals: false }).values;
  } catch (e) {
    throw new BadInput(e instanceof Error ? e.message : String(e));
  }
  const parsed = schema.safeParse(values);
  if (!parsed.success) {
    throw new BadInput(parsed.error.issues.map((i) => `--${i.path.join('.') || '?'}: ${i.message}`).join('; '));
  }
  return parsed.data;
}
