import { z } from 'zod';
import { suiteSchema } from './schemas/suite-schema';

/** The suite file format as JSON Schema (draft 2020-12), generated from the zod schema, for editors and other tools. */
export function suiteJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(suiteSchema, { io: 'input', unrepresentable: 'any' }),
    $id: 'https://sheetkeeper.invalid/suite.schema.json',
    title: 'Sheetkeeper suite',
  };
}
