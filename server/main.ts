import 'reflect-metadata';
import { loadConfig } from './config';
import { createApp } from './create-app';
import { ownOrigins } from './http/own-origins';
import { createDataSource } from './data-source';
import { DEMO_USERS } from './seed/demo-users';
import { onShutdown } from './on-shutdown';
import { PlanScheduler } from './plans/plan-scheduler';
import { RunService } from './runs/run-service';
import { syncTargets } from './targets/sync-targets';
import { startServices } from './start-services';

async function main(): Promise<void> {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const pending = await dataSource.showMigrations();
  if (pending) throw new Error('The database has pending migrations: run `npm run migrate` (npm start does).');
  await syncTargets(dataSource);

  const services = await startServices(dataSource, config, { workers: config.workers, deliverMail: true });
  const runs = new RunService(dataSource, services.queue);
  const scheduler = new PlanScheduler(
    dataSource,
    async (planId) => (await runs.start(planId, 'schedule', null)).run.id,
  );
  await scheduler.start();

  const origins = [...config.allowedOrigins];
  const { app, close, targetSources } = createApp({
    dataSource,
    databaseUrl: config.databaseUrl,
    sessionSecret: config.sessionSecret,
    secureCookies: config.secureCookies,
    webDir: config.webDir,
    shardQueue: services.queue,
    referenceCacheDir: config.referenceCacheDir,
    allowedOrigins: origins,
    trustProxy: config.trustProxy,
    targetCacheDir: config.targetCacheDir,
    appUrl: config.appUrl,
  });
  const unfinished = await targetSources.resumePending();
  if (unfinished > 0) console.log(`[sheetkeeper] resolving ${unfinished} added target source(s) left unfinished`);
  const server = app.listen(config.port, config.host, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    // Port 0: the origins made from the configured port name no real address; add the bound one's.
    if (config.port === 0 && !process.env.SHEETKEEPER_ORIGINS)
      origins.push(...ownOrigins(config.appUrl, port, undefined));
    console.log(`\nSheetkeeper is serving http://${config.host}:${port}/`);
    console.log(
      services.fakeSmtp
        ? `Mail goes to the local mail store on ${config.host}:${services.smtpPort} (Outbox screen, admins).`
        : `Mail goes to SMTP on ${config.host}:${services.smtpPort}.`,
    );
    console.log(`Shard workers in this process: ${config.workers} (add more with \`npm run worker\`).`);
    console.log('Demo sign-ins:');
    for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(11)} ${u.email.padEnd(28)} ${u.password}`);
    console.log('');
  });
  onShutdown(async () => {
    await new Promise((resolve) => server.close(resolve));
    await Promise.all([scheduler.stop(), services.stop(), close()]);
    await dataSource.destroy();
  });
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
