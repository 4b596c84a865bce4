import { readFileSync } from 'node:fs';
import path from 'node:path';
import { sheetkeeperConfigJsonSchema } from '../../shared/sheetkeeper-config-json-schema';

describe('sheetkeeperConfigJsonSchema', () => {
  it('keeps sheetkeeper.config.schema.json equal to the JSON Schema generated from the zod schema (npm run config:schema)', () => {
    const committed = JSON.parse(
      readFileSync(path.join(__dirname, '..', '..', 'sheetkeeper.config.schema.json'), 'utf8'),
    );
    expect(committed).toEqual(sheetkeeperConfigJsonSchema());
  });
});
