import { z } from 'zod';
import { programTargetSource } from '../target-source';
import { textSchema } from './text-schema';

/**
 * The input of `sheetkeeper adapter-check` (flags as strings): exactly one of `--program "COMMAND ARGS"`
 * (a stdio program, split into words by harness/command-support/parse-program-flag.ts) and
 * `--target NAME` (an installed stdio target as `sheetkeeper targets` lists it), the per-request
 * time limit, and how to write the report.
 */
export const adapterCheckRequest = z
  .strictObject({
    program: textSchema().min(1, { error: 'names no command' }).optional(),
    target: textSchema().min(1, { error: 'names no target' }).optional(),
    /** Milliseconds; the same bounds as a program source's `timeLimitMs` (shared/target-source.ts). */
    'time-limit': textSchema()
      .regex(/^\d{1,7}$/, { error: 'must be a whole number of milliseconds' })
      .transform(Number)
      .pipe(programTargetSource.shape.timeLimitMs.unwrap())
      .optional(),
    format: z.enum(['json', 'table'], { error: 'must be json or table' }).default('table'),
    out: textSchema().min(1).optional(),
  })
  .refine((r) => (r.program === undefined) !== (r.target === undefined), {
    error: 'give exactly one of --program "COMMAND ARGS" and --target NAME',
    path: ['program'],
  });

export type AdapterCheckRequest = z.infer<typeof adapterCheckRequest>;
