import 'reflect-metadata';
import { databaseUrl } from '../server/config';
import { createDataSource } from '../server/data-source';
import { seedDemo } from '../server/seed/seed-demo';

async function main(): Promise<void> {
  const dataSource = createDataSource(databaseUrl());
  await dataSource.initialize();
  try {
    const added = await seedDemo(dataSource);
    console.log(`[sheetkeeper] demo data: ${added} user(s) added`);
  } finally {
    await dataSource.destroy();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
