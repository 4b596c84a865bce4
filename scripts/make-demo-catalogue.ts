import { mkdirSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { validateSuite } from '../shared/validate-suite';
import { demoCatalogue } from './demo-catalogue/demo-catalogue';

/**
 * `npm run suites:demo`: writes the demo catalogue to suites/demo/, one file per suite,
 * each validated with the shared schema first. A test keeps the files equal to this output.
 */
const OUT = path.join(__dirname, '..', 'suites', 'demo');
const suites = demoCatalogue();

for (const suite of suites) {
  const checked = validateSuite(suite, suite.id);
  if (!checked.ok) throw new Error(checked.issues.map((i) => `${i.suite}: ${i.field} ${i.rule}`).join('\n'));
}
mkdirSync(OUT, { recursive: true });
for (const file of readdirSync(OUT)) if (file.endsWith('.json')) rmSync(path.join(OUT, file));
for (const suite of suites) writeFileSync(path.join(OUT, `${suite.id}.json`), `${JSON.stringify(suite, null, 2)}\n`);
console.log(`[sheetkeeper] wrote ${suites.length} demo suites to suites/demo/`);
