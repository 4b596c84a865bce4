import { parseArgs } from 'node:util';
import type { z } from 'zod';
import { BadInput } from './bad-input';

/**
 * Reads `--name value` flags (node:util parseArgs, strict: an unknown flag is an error) and
 * validates them with the command's one zod schema; anything wrong becomes {@link BadInput}
 * naming the flag and the rule.
 */
export function readFlags<T extends z.ZodType>(
  argv: readonly string[],
  names: readonly string[],
  schema: T,
): z.infer<T> {
  let values: Record<string, unknown>;
  // parseArgs takes "--box -4,-4,4,4" for a missing value followed by a short flag; a value
  // that starts with "-" (a negative number) is glued to its flag first.
  const args: string[] = [];
  for (let i = 0; i < argv.length; i += 1) {
    const token = argv[i]!;
    const next = argv[i + 1];
    if (
      token.startsWith('--') &&
      !token.includes('=') &&
      names.includes(token.slice(2)) &&
      next !== undefined &&
      next.startsWith('-') &&
      !next.startsWith('--')
    ) {
      args.push(`${token}=${next}`);
      i += 1;
    } else args.push(token);
  }
  try {
    const options = Object.fromEntries(names.map((n) => [n, { type: 'string' as const }]));
    values = parseArgs({ args, options, strict: true, allowPositionals: false }).values;
  } catch (e) {
    throw new BadInput(e instanceof Error ? e.message : String(e));
  }
  const parsed = schema.safeParse(values);
  if (!parsed.success) {
    throw new BadInput(parsed.error.issues.map((i) => `--${i.path.join('.') || '?'}: ${i.message}`).join('; '));
  }
  return parsed.data;
}
