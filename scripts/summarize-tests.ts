// Adds up jest's JSON reports (and the steps before them: type check, lint, format) into the one closing line
// "Tests: N passed, N failed", and exits non-zero when anything failed or did not run.
import { existsSync, readFileSync } from 'node:fs';

/** The parts of jest's --json report that are read here. */
interface JestReport {
  numPassedTests: number;
  numFailedTests: number;
  numPendingTests: number;
  numTodoTests: number;
  numTotalTests: number;
  testResults: { name: string; status: string; message: string; assertionResults: { status: string }[] }[];
}

const args = process.argv.slice(2);
/** `--step "what it was=exit status"`: a step that ran before jest; each failed one counts as one failure. */
const steps: { name: string; status: number }[] = [];
const files: string[] = [];
for (let i = 0; i < args.length; i += 1) {
  if (args[i] === '--step') {
    const [name = '?', status = '1'] = (args[++i] ?? '').split(/=(?=[^=]*$)/);
    steps.push({ name, status: Number(status) });
  } else files.push(args[i]!);
}

let passed = 0;
let failed = 0;
let skipped = 0;
const problems: string[] = [];
for (const step of steps) {
  if (step.status !== 0) {
    failed += 1;
    problems.push(`${step.name} failed`);
  }
}
for (const file of files) {
  if (!existsSync(file)) {
    failed += 1;
    problems.push(`${file} is missing: that jest run did not finish`);
    continue;
  }
  const report = JSON.parse(readFileSync(file, 'utf8')) as JestReport;
  passed += report.numPassedTests;
  failed += report.numFailedTests;
  skipped += report.numPendingTests + report.numTodoTests;
  // A test file that could not run (syntax error, failing hook) has no failed test in it but is a failure.
  for (const suite of report.testResults) {
    if (suite.status === 'failed' && suite.assertionResults.every((a) => a.status !== 'failed')) {
      failed += 1;
      problems.push(`${suite.name} did not run: ${(suite.message || '').split('\n').find((l) => l.trim()) ?? ''}`);
    }
  }
  if (report.numTotalTests === 0) {
    failed += 1;
    problems.push(`${file} ran no test`);
  }
}
for (const p of problems) console.log(`[sheetkeeper] ${p}`);
console.log(`Tests: ${passed} passed, ${failed} failed${skipped ? `, ${skipped} skipped` : ''}`);
process.exit(failed > 0 ? 1 : 0);
