import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { sheetkeeperConfigJsonSchema } from '../shared/sheetkeeper-config-json-schema';

/** `npm run config:schema`: writes sheetkeeper.config.schema.json from the zod schema (a test keeps the two equal). */
const file = path.join(__dirname, '..', 'sheetkeeper.config.schema.json');
writeFileSync(file, `${JSON.stringify(sheetkeeperConfigJsonSchema(), null, 2)}\n`);
console.log(`[sheetkeeper] wrote ${path.relative(process.cwd(), file)}`);
