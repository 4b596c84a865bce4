import { createApp, type AppOptions, type SheetkeeperApp } from '../../server/create-app';
import { ownOrigins } from '../../server/http/own-origins';
import { idleShardQueue } from './idle-shard-queue';
import { createTestDatabase, type TestDatabase } from './test-database';

export interface TestApp extends SheetkeeperApp {
  db: TestDatabase;
  stop(): Promise<void>;
}

/** The origins the test app accepts pages from: the default for a server on 127.0.0.1:8460. */
export const TEST_APP_ORIGINS = ownOrigins('http://127.0.0.1:8460', 8460, undefined);

/** The real app over a private test database; call `stop()` in afterAll. */
export async function startTestApp(overrides: Partial<AppOptions> = {}): Promise<TestApp> {
  const db = await createTestDatabase();
  const built = createApp({
    dataSource: db.dataSource,
    databaseUrl: db.url,
    sessionSecret: 'test-secret',
    shardQueue: idleShardQueue(),
    allowedOrigins: TEST_APP_ORIGINS,
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
