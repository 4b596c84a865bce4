import { z } from 'zod';
import { sheetkeeperConfig } from './sheetkeeper-config';

/** The project file's format as JSON Schema (draft 2020-12), generated from the zod schema, for editors. */
export function sheetkeeperConfigJsonSchema(): Record<string, unknown> {
  return {
    ...z.toJSONSchema(sheetkeeperConfig, { io: 'input', unrepresentable: 'any' }),
    $id: 'https://sheetkeeper.invalid/sheetkeeper.config.schema.json',
    title: 'Sheetkeeper project configuration',
  };
}
