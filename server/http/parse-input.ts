import type { z } from 'zod';
import { fieldIssues } from '../../shared/field-issues';
import { InputError } from './input-error';

/**
 * Validates one part of a request with its shared schema. `where` prefixes field
 * names (`body`, `params`, `query`) so a client knows which part was wrong.
 */
export function parseInput<S extends z.ZodType>(
  schema: S,
  value: unknown,
  where: 'body' | 'params' | 'query',
): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  throw new InputError(
    fieldIssues(result.error).map((issue) => ({
      field: issue.field === '(body)' ? where : `${where}.${issue.field}`,
      rule: issue.rule,
    })),
  );
}
