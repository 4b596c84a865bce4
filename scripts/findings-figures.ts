/**
 * `node --import tsx scripts/findings-figures.ts RUN.json [RUN.json …]`: for each run result
 * written by `sheetkeeper run --format json`, the failures by class and label (every label, and
 * the leading one), and how many failures are noise — within 4 eps normwise of the expected value
 * with the right zero signs (findings-figures/count-findings.ts) — with up to five of them. Used for issue 13's
 * before/after figures on the demo catalogue against complex.js 2.4.3 (docs/suite-format.md
 * "Tolerances").
 */
import { readFileSync } from 'node:fs';
import type { RunResult } from '../shared/run-result';
import { countFindings } from './findings-figures/count-findings';

const files = process.argv.slice(2);
if (files.length === 0) {
  console.error('usage: node --import tsx scripts/findings-figures.ts RUN.json [RUN.json …]');
  process.exit(2);
}
for (const file of files) {
  const result = JSON.parse(readFileSync(file, 'utf8')) as RunResult;
  const f = countFindings(result);
  const c = result.counts;
  console.log(
    `${file}: ${c.pass} pass, ${c.fail} fail, ${c.error} error, ${c.skipped} skipped, ${c.notApplicable ?? 0} not applicable`,
  );
  console.log(
    `  failures listed ${f.listed} of ${f.failures}: branch ${f.byClass.branch}, accuracy ${f.byClass.accuracy}`,
  );
  console.log(`  every label: ${JSON.stringify(f.byLabel)}`);
  console.log(`  leading label: ${JSON.stringify(f.byLeading)}`);
  console.log(
    `  failures within 4 eps (8.88e-16) normwise with the right zero signs: ${f.noise} (of which every part's sign right: ${f.noiseSameSigns})`,
  );
  for (const e of f.noiseExamples) console.log(`    ${e}`);
}
