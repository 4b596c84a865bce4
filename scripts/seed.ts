import 'reflect-metadata';
import { databaseUrl, loadConfig } from '../server/config';
import { createDataSource } from '../server/data-source';
import { seedDemo } from '../server/seed/seed-demo';
import { seedDemoCatalogue } from '../server/seed/seed-demo-catalogue';
import { seedDemoRuns } from '../server/seed/seed-demo-runs';
import { syncTargets } from '../server/targets/sync-targets';
import { describeError } from '../server/database/describe-error';

/** `npm run seed`: demo users, the installed targets, the demo catalogue and plans, two completed demo runs — only what is missing. */
async function main(): Promise<void> {
  const dataSource = createDataSource(databaseUrl());
  await dataSource.initialize();
  try {
    const users = await seedDemo(dataSource);
    const targets = await syncTargets(dataSource);
    const { suites, plans } = await seedDemoCatalogue(dataSource);
    const config = loadConfig();
    const began = Date.now();
    const runs = await seedDemoRuns(dataSource, {
      smtp: { host: config.host, port: config.smtpPort },
      appUrl: config.appUrl,
      referenceCacheDir: config.referenceCacheDir,
    });
    console.log(
      `[sheetkeeper] demo data: ${users} user(s), ${suites} suite(s), ${plans} plan(s), ${runs} run(s) added${runs ? ` (runs took ${((Date.now() - began) / 1000).toFixed(1)} s)` : ''}; ${targets} target(s) installed`,
    );
  } finally {
    await dataSource.destroy();
  }
}

main().catch((err) => {
  console.error(describeError(err));
  process.exit(1);
});
