/**
 * `node --import tsx scripts/measure-findings-lanes.ts`: what the Libraries screen does to the
 * findings threads. On a pool of two warm threads it asks for the version matrix of complex.js over
 * the demo catalogue in groups of four suites (as client/use-version-matrix.ts does), then for a
 * fingerprint, and prints how long the fingerprint took, how many matrix groups were answered
 * before it, and how long all of them took. The figures in docs/review-and-weight.md come from it.
 */
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { FindingsPool } from '../server/findings/findings-pool';
import { validateSuite } from '../shared/validate-suite';

const dir = path.join(__dirname, '..', 'suites', 'demo');
const suites = readdirSync(dir)
  .filter((f) => f.endsWith('.json'))
  .sort()
  .map((f) => {
    const checked = validateSuite(JSON.parse(readFileSync(path.join(dir, f), 'utf8')), f);
    if (!checked.ok) throw new Error(`${f} is not a valid suite`);
    return checked.suite;
  });

async function main(): Promise<void> {
  const pool = new FindingsPool(120_000, 2, 16);
  const warm = () => pool.ask({ kind: 'fingerprint', target: 'complex.js@2.4.3', functions: ['sqrt'] });
  await Promise.all([warm(), warm()]);
  const started = performance.now();
  let answered = 0;
  const groups: Promise<number>[] = [];
  for (let i = 0; i < suites.length; i += 4)
    groups.push(
      pool
        .ask({ kind: 'version-matrix', library: 'complex.js', suites: suites.slice(i, i + 4) })
        .then(() => (answered += 1)),
    );
  const fingerprint = await pool
    .ask({ kind: 'fingerprint', target: 'complex.js@2.4.3', functions: ['log', 'asin', 'acos'] })
    .then(() => ({ ms: Math.round(performance.now() - started), groupsBefore: answered }));
  await Promise.all(groups);
  console.log(
    `fingerprint ${fingerprint.ms} ms after ${fingerprint.groupsBefore} of ${groups.length} matrix groups; ` +
      `all groups ${Math.round(performance.now() - started)} ms`,
  );
  await pool.close();
}

void main();
