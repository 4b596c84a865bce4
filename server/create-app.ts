import express, { type Express } from 'express';
import session from 'express-session';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import type { ApiError } from '../shared/api-error';
import { errorHandler } from './middleware/error-handler';
import { webAppRouter } from './http/web-app-router';
import { sameOriginGuard } from './middleware/same-origin-guard';
import { tokenAuth } from './middleware/token-auth';
import { authRouter } from './routes/auth-router';
import { deviationsRouter } from './routes/deviations-router';
import { failuresRouter } from './routes/failures-router';
import { meRouter } from './routes/me-router';
import { openApiRouter } from './routes/openapi-router';
import { outboxRouter } from './routes/outbox-router';
import { overviewRouter } from './routes/overview-router';
import { plansRouter } from './routes/plans-router';
import { runsRouter } from './routes/runs-router';
import { schedulesRouter } from './routes/schedules-router';
import { subscriptionsRouter } from './routes/subscriptions-router';
import { suitesRouter } from './routes/suites-router';
import { targetsRouter } from './routes/targets-router';
import { librariesRouter } from './routes/libraries-router';
import { tokensRouter } from './routes/tokens-router';
import { targetSourcesRouter } from './routes/target-sources-router';
import { TargetSourceResolver } from './targets/target-source-resolver';
import { targetSourceOptions } from './targets/target-source-options';
import { usersRouter } from './routes/users-router';
import { accountLinksRouter } from './routes/account-links-router';
import { AccountLinks } from './auth/account-links';
import { SessionControl } from './auth/session-control';
import { UserAdmin } from './auth/user-admin';
import { workersRouter } from './routes/workers-router';
import { configurePassport } from './auth/configure-passport';
import { createPgPool } from './database/create-pg-pool';
import { LibraryFindings } from './findings/library-findings';
import { ReferenceTableChecks } from './suites/reference-table-checks';
import { OverviewMemo } from './views/overview-memo';
import { createSessionStore } from './auth/create-session-store';
import { ShortLivedCache } from './auth/short-lived-cache';
import type { User } from './entities/user';
import { RunService } from './runs/run-service';
import type { ShardQueue } from './runs/shard-queue';
import { DEFAULT_SIGN_IN_LIMITS, SignInLimiter, type SignInLimits } from './auth/sign-in-limiter';

export interface AppOptions {
  dataSource: DataSource;
  databaseUrl: string;
  sessionSecret: string;
  secureCookies?: boolean;
  /** The exported web app; when missing, only the API is served. */
  webDir?: string;
  signInLimits?: SignInLimits;
  /** Where the shards of a started run go (the shards table in the server, sql-shard-queue.ts). */
  shardQueue: ShardQueue;
  /** The runs' reference values on disk, read by the case pictures (config.referenceCacheDir). */
  referenceCacheDir?: string | null;
  /** Origins whose pages may change data (config.allowedOrigins); see same-origin-guard.ts. */
  allowedOrigins: readonly string[];
  /** Express's `trust proxy` (config.trustProxy); off unless a proxy in front sets X-Forwarded-For. */
  trustProxy?: string | number | false;
  /** Base of the links in mail (config.appUrl); tests get the default server's address. */
  appUrl?: string;
  /** How long checking one uploaded reference table may take (REFERENCE_TABLE_BUDGET_MS). */
  referenceTableBudgetMs?: number;
  /** Where admin-added npm versions are installed (config.targetCacheDir; `.data/target-cache` by default). */
  targetCacheDir?: string;
}

export interface SheetkeeperApp {
  app: Express;
  /** Resolves admin-added target sources in the background (the server resumes unfinished ones at start). */
  targetSources: TargetSourceResolver;
  /** Ends the pool behind sessions and sign-in limits and the findings and reference-table threads (the data source is the caller's). */
  close(): Promise<void>;
}

export const SESSION_COOKIE = 'sheetkeeper.sid';

/** The app's address when none is given: the default server's (config.ts). */
const DEFAULT_APP_URL = 'http://127.0.0.1:8460';

/**
 * How long this process trusts a session row and a user row it has read (see
 * create-session-store.ts for the measurements). Changes made through this process apply at once.
 */
const SIGNED_IN_CACHE_MS = 2000;

/** The Express app: API under /api, the exported web app everywhere else. */
export function createApp(options: AppOptions): SheetkeeperApp {
  // Sessions are read on every API request; with 5 connections 50 concurrent readers queued here.
  const pool = createPgPool(options.databaseUrl, 10);
  const userCache = new ShortLivedCache<User>(SIGNED_IN_CACHE_MS);
  const sessionCache = new ShortLivedCache<string>(SIGNED_IN_CACHE_MS);
  const sessions = new SessionControl(options.dataSource, sessionCache, userCache);
  const accountLinks = new AccountLinks(options.dataSource, options.appUrl ?? DEFAULT_APP_URL);
  const passport = configurePassport(options.dataSource, userCache);
  const limiter = new SignInLimiter(pool, options.signInLimits ?? DEFAULT_SIGN_IN_LIMITS);
  const findings = new LibraryFindings(options.dataSource);
  const referenceTables = new ReferenceTableChecks(options.referenceTableBudgetMs);
  const overviewMemo = new OverviewMemo();
  const targetSources = new TargetSourceResolver(options.dataSource, targetSourceOptions(options.targetCacheDir));

  const app = express();
  app.disable('x-powered-by');
  // req.ip is the sign-in limiter's client: the peer address unless a trusted proxy names another.
  app.set('trust proxy', options.trustProxy ?? false);
  // API answers are no-store, so an ETag (a hash of every body, ~0.1 ms for a 34 KB failure page) buys nothing.
  app.set('etag', false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // react-native-web and expo-font write <style> elements at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
        },
      },
    }),
  );

  const api = express.Router();
  api.use((_req, res, next) => {
    res.set('Cache-Control', 'no-store');
    next();
  });
  // Before the body, the session and the routes: a foreign page's request reads and changes nothing.
  api.use(sameOriginGuard(options.allowedOrigins));
  // Suite bodies from the form reach ~4 KB for the demo catalogue; 256 KB matches the upload limit.
  api.use(express.json({ limit: '256kb', strict: true }));
  api.use(
    session({
      name: SESSION_COOKIE,
      store: createSessionStore(pool, sessionCache),
      secret: options.sessionSecret,
      resave: false,
      saveUninitialized: false,
      rolling: false,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: options.secureCookies ?? false,
        maxAge: 7 * 24 * 3600 * 1000,
        path: '/',
      },
    }),
  );
  api.use(passport.initialize());
  api.use(passport.session());
  api.use(tokenAuth(options.dataSource));
  api.use(overviewMemo.forgetOnWrite);

  api.use('/auth', authRouter(passport, limiter));
  api.use('/me', meRouter());
  api.use('/account-links', accountLinksRouter(accountLinks, limiter, sessions));
  api.use('/users', usersRouter(options.dataSource, new UserAdmin(options.dataSource, sessions), accountLinks));
  api.use('/suites', suitesRouter(options.dataSource, referenceTables));
  api.use('/outbox', outboxRouter(options.dataSource));
  api.use('/targets', targetsRouter(options.dataSource));
  api.use('/targets', librariesRouter(findings));
  api.use('/target-sources', targetSourcesRouter(options.dataSource, targetSources));
  api.use('/plans', plansRouter(options.dataSource));
  api.use('/schedules', schedulesRouter(options.dataSource));
  api.use('/runs', runsRouter(options.dataSource, new RunService(options.dataSource, options.shardQueue)));
  api.use('/failures', failuresRouter(options.dataSource, { referenceCacheDir: options.referenceCacheDir }));
  api.use('/deviations', deviationsRouter(options.dataSource));
  api.use('/tokens', tokensRouter(options.dataSource));
  api.use('/subscriptions', subscriptionsRouter(options.dataSource));
  api.use('/overview', overviewRouter(options.dataSource, overviewMemo));
  api.use('/workers', workersRouter(options.dataSource));
  api.use('/openapi.json', openApiRouter(SESSION_COOKIE));
  api.use((_req, res) => {
    res.status(404).json({ kind: 'not-found', message: 'No such API route.' } satisfies ApiError);
  });
  api.use(errorHandler);
  app.use('/api', api);

  const webDir = options.webDir;
  if (webDir && existsSync(path.join(webDir, 'index.html'))) {
    app.use(webAppRouter(webDir));
  } else {
    app.get('/{*splat}', (_req, res) =>
      res.status(503).type('text').send('The web app is not exported yet: run `npm start`.'),
    );
  }

  return {
    app,
    targetSources,
    close: async () => {
      // A source being described is bounded by its program's time limit; its row is written before the pool ends.
      await targetSources.idle();
      await findings.close();
      await referenceTables.close();
      await pool.end();
    },
  };
}
