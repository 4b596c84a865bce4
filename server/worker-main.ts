import 'reflect-metadata';
import { loadConfig } from './config';
import { createDataSource } from './data-source';
import { onShutdown } from './on-shutdown';
import { startServices } from './start-services';

/**
 * `npm run worker`: one more shard worker against the same database, on this machine or
 * another (set DATABASE_URL there). It sends no mail and serves nothing.
 */
async function main(): Promise<void> {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const services = await startServices(dataSource, config, {
    workers: Math.max(1, config.workers),
    deliverMail: false,
  });
  console.log(`[sheetkeeper] worker ${process.pid} is taking shards`);
  onShutdown(async () => {
    await services.stop();
    await dataSource.destroy();
  });
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
