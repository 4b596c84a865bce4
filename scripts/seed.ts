import 'reflect-metadata';
import { databaseUrl } from '../server/config';
import { createDataSource } from '../server/data-source';
import { seedDemo } from '../server/seed/seed-demo';
import { seedDemoCatalogue } from '../server/seed/seed-demo-catalogue';
import { syncTargets } from '../server/services/sync-targets';

/** `npm run seed`: demo users, the installed targets, the demo catalogue and plans — only what is missing. */
async function main(): Promise<void> {
  const dataSource = createDataSource(databaseUrl());
  await dataSource.initialize();
  try {
    const users = await seedDemo(dataSource);
    const targets = await syncTargets(dataSource);
    const { suites, plans } = await seedDemoCatalogue(dataSource);
    console.log(`[sheetkeeper] demo data: ${users} user(s), ${suites} suite(s), ${plans} plan(s) added; ${targets} target(s) installed`);
  } finally {
    await dataSource.destroy();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
