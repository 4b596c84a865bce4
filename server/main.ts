import 'reflect-metadata';
import { loadConfig } from './config';
import { createApp } from './create-app';
import { createDataSource } from './data-source';
import { DEMO_USERS } from './seed/demo-users';
import { FakeSmtpServer } from './services/fake-smtp-server';
import { MailOutbox } from './services/mail-outbox';

/** How often due mail is sent; a regression mail waits at most this long after its run ends. */
const MAIL_INTERVAL_MS = 5000;

async function main(): Promise<void> {
  const config = loadConfig();
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  const pending = await dataSource.showMigrations();
  if (pending) throw new Error('The database has pending migrations: run `npm run migrate` (npm start does).');

  const smtp = config.fakeSmtp ? new FakeSmtpServer(dataSource, config.host) : null;
  const smtpPort = smtp ? await smtp.start(config.smtpPort) : config.smtpPort;
  const outbox = new MailOutbox(dataSource, { host: config.host, port: smtpPort });
  let delivering = false;
  const mailTimer = setInterval(() => {
    if (delivering) return;
    delivering = true;
    outbox
      .deliverDue()
      .catch((err: unknown) => console.error('[sheetkeeper] mail delivery failed', err))
      .finally(() => {
        delivering = false;
      });
  }, MAIL_INTERVAL_MS);

  const { app, close } = createApp({ dataSource, databaseUrl: config.databaseUrl, sessionSecret: config.sessionSecret, secureCookies: config.secureCookies, webDir: config.webDir });
  const server = app.listen(config.port, config.host, () => {
    const address = server.address();
    const port = typeof address === 'object' && address ? address.port : config.port;
    const url = `http://${config.host}:${port}/`;
    console.log(`\nSheetkeeper is serving ${url}`);
    console.log(smtp ? `Mail goes to the local mail store on ${config.host}:${smtpPort} (Outbox screen, admins).` : `Mail goes to SMTP on ${config.host}:${smtpPort}.`);
    console.log('Demo sign-ins:');
    for (const u of DEMO_USERS) console.log(`  ${u.role.padEnd(11)} ${u.email.padEnd(28)} ${u.password}`);
    console.log('');
  });
  const shutdown = () => {
    clearInterval(mailTimer);
    server.close(() => {
      outbox.close();
      void Promise.all([close(), smtp?.stop()])
        .then(() => dataSource.destroy())
        .then(() => process.exit(0));
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
