import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { suiteJsonSchema } from '../shared/suite-json-schema';

/** `npm run suites:schema`: writes suites/suite.schema.json from the zod schema (a test keeps the two equal). */
const file = path.join(__dirname, '..', 'suites', 'suite.schema.json');
writeFileSync(file, `${JSON.stringify(suiteJsonSchema(), null, 2)}\n`);
console.log(`[sheetkeeper] wrote ${path.relative(process.cwd(), file)}`);
