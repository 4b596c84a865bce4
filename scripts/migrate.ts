import 'reflect-metadata';
import { databaseUrl } from '../server/config';
import { createDataSource } from '../server/data-source';
import { describeError } from '../server/database/describe-error';

/** `npm run migrate`: applies pending migrations; `--revert-all` undoes every one (used by the migration test). */
async function main(): Promise<void> {
  const dataSource = createDataSource(databaseUrl());
  await dataSource.initialize();
  try {
    if (process.argv.includes('--revert-all')) {
      while (
        (await dataSource.query(`SELECT to_regclass('migrations') AS t`))[0].t &&
        (await dataSource.query('SELECT 1 FROM migrations LIMIT 1')).length > 0
      ) {
        await dataSource.undoLastMigration({ transaction: 'each' });
      }
      console.log('[sheetkeeper] every migration reverted');
      return;
    }
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    console.log(
      `[sheetkeeper] migrations: ${applied.length} applied${applied.length ? ` (${applied.map((m) => m.name).join(', ')})` : ', database up to date'}`,
    );
  } finally {
    await dataSource.destroy();
  }
}

main().catch((err) => {
  console.error(describeError(err));
  process.exit(1);
});
