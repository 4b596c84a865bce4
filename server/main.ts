import 'reflect-metadata';
import { loadConfig } from './config';
import { createApp } from './create-app';
import { createDataSource } from './data-source';
import { DEMO_USERS } from './seed/demo-users';

async function main(): Promise<void> {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const pending = await dataSource.showMigrations();
  if (pending) throw new Error('The database has pending migrations: run `npm run migrate` (npm start does).');
  const { app, close } = createApp({ dataSource, databaseUrl: config.databaseUrl, sessionSecret: config.sessionSecret, secureCookies: config.secureCookies, webDir: config.webDir });
  const server = app.listen(config.port, config.host, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    const url = `http://${config.host}:${port}/`;
    console.log(`\nSheetkeeper is serving ${url}`);
    console.log('Demo sign-ins:');
    for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(11)} ${u.email.padEnd(28)} ${u.password}`);
    console.log('');
  });
  const shutdown = () => {
    server.close(() => {
      void close().then(() => dataSource.destroy()).then(() => process.exit(0));
    });
    setTimeout(() => process.exit(0), 5000);
  };
  process.on('SIGTERM', shutdown);
  process.on('SIGINT', shutdown);
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
