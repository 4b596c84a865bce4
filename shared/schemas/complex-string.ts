import { z } from 'zod';
import { textSchema } from './text-schema';

/** A real number on the wire: decimal, C hex float, p/q, "inf", "-inf", "nan" or "-0". */
export const numberString = textSchema('must be a number written as a string')
  .max(400, { error: 'must be at most 400 characters' })
  .regex(
    /^\s*([+-]?(inf|infinity|nan)|[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?|[+-]?0[xX]([0-9a-fA-F]+\.?[0-9a-fA-F]*|\.[0-9a-fA-F]+)([pP][+-]?\d+)?|[+-]?\d+\/\d+)\s*$/i,
    { error: 'must be a decimal, a hex float, p/q, inf, -inf or nan' },
  );

/** A complex number on the wire, docs/suite-format.md: `{"re": "...", "im": "..."}`. */
export const complexString = z.strictObject(
  { re: numberString, im: numberString },
  {
    error: (issue) =>
      issue.code === 'unrecognized_keys'
        ? `has unknown fields: ${issue.keys.join(', ')}`
        : 'must be {"re": "...", "im": "..."}',
  },
);

export type ComplexString = z.infer<typeof complexString>;
