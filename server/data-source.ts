import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { OutboxMail } from './entities/outbox-mail';
import { ReceivedMail } from './entities/received-mail';
import { Suite } from './entities/suite';
import { SuiteVersion } from './entities/suite-version';
import { User } from './entities/user';
import { UsersSessionsSignInLimits1764626400000 } from './migrations/1764626400000-users-sessions-sign-in-limits';
import { SuitesAndVersions1764700000000 } from './migrations/1764700000000-suites-and-versions';
import { MailOutboxAndReceivedMail1764710000000 } from './migrations/1764710000000-mail-outbox-and-received-mail';

/** Entities and migrations are listed, not globbed, so tsx, jest and tsc builds all find them. */
export const ENTITIES = [User, Suite, SuiteVersion, OutboxMail, ReceivedMail];
export const MIGRATIONS = [UsersSessionsSignInLimits1764626400000, SuitesAndVersions1764700000000, MailOutboxAndReceivedMail1764710000000];

export function createDataSource(url: string): DataSource {
  return new DataSource({
    type: 'postgres',
    url,
    entities: ENTITIES,
    migrations: MIGRATIONS,
    migrationsTableName: 'migrations',
    synchronize: false,
    logging: ['error'],
    extra: { max: 10 },
  });
}
