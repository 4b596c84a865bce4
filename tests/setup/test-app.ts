import { createApp, type AppOptions, type SheetkeeperApp } from '../../server/create-app';
import { idleShardQueue } from './idle-shard-queue';
import { createTestDatabase, type TestDatabase } from './test-database';

export interface TestApp extends SheetkeeperApp {
  db: TestDatabase;
  stop(): Promise<void>;
}

/** The real app over a private test database; call `stop()` in afterAll. */
export async function startTestApp(overrides: Partial<AppOptions> = {}): Promise<TestApp> {
  const db = await createTestDatabase();
  const built = createApp({
    dataSource: db.dataSource,
    databaseUrl: db.url,
    sessionSecret: 'test-secret',
    shardQueue: idleShardQueue(),
    ...overrides,
  });
  return {
    ...built,
    db,
    stop: async () => {
      await built.close();
      await db.drop();
    },
  };
}
