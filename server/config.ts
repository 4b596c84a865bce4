import { randomBytes } from 'node:crypto';
import { chmodSync, existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { clusterUrl } from './database/cluster-url';
import { cacheDirFromEnv } from '../harness';
import { ownOrigins } from './http/own-origins';

export const PROJECT_ROOT = path.resolve(__dirname, '..');
const DATA_DIR = path.join(PROJECT_ROOT, '.data');
/**
 * Where this process installs added npm targets: `SHEETKEEPER_CACHE_DIR` (the harness's one reader
 * of it), else the project's .data/target-cache. Read by the config and by the findings threads,
 * which build no config, so both install into the same folder.
 */
export const targetCacheDir = (): string => cacheDirFromEnv() ?? path.join(DATA_DIR, 'target-cache');

export interface ServerConfig {
  /** Always a loopback address: Sheetkeeper never listens elsewhere. */
  host: string;
  port: number;
  databaseUrl: string;
  sessionSecret: string;
  /** Secure cookies only when the app is served over HTTPS by a proxy. */
  secureCookies: boolean;
  webDir: string;
  /** Where mail is sent (SMTP on loopback). */
  smtpPort: number;
  /** Run the local fake SMTP server in this process (on unless SHEETKEEPER_FAKE_SMTP=0). */
  fakeSmtp: boolean;
  /** Shard workers in the server process (SHEETKEEPER_WORKERS, default 1; `npm run worker` adds more). */
  workers: number;
  /**
   * Which of this machine's targets its shard workers take (SHEETKEEPER_WORKER_TARGETS: names or
   * name prefixes, comma-separated; narrow-targets.ts), or null for all of them.
   */
  workerTargets: string[] | null;
  /** Base of links in mail (SHEETKEEPER_APP_URL, default the server's own address). */
  appUrl: string;
  /**
   * Where reference values computed for runs are kept on disk (`.data/reference-cache`), so a
   * case page reads the values its run computed instead of computing them again.
   */
  referenceCacheDir: string;
  /**
   * Where npm versions named by target sources are installed and tarballs unpacked, one folder per
   * package and version: SHEETKEEPER_CACHE_DIR when set (the same folder the CLI and the C adapter's
   * build use, harness/cache-dir.ts), else `.data/target-cache` beside the checkout; each worker
   * machine, or each worker process given its own SHEETKEEPER_CACHE_DIR, keeps its own.
   */
  targetCacheDir: string;
  /** Origins whose pages may change data (SHEETKEEPER_ORIGINS, default the app URL and this address's loopback names). */
  allowedOrigins: string[];
  /**
   * Express's `trust proxy` (SHEETKEEPER_TRUST_PROXY, default off): which peers' X-Forwarded-For
   * names the client for the sign-in limiter. Off, the peer of the loopback listener is the client.
   */
  trustProxy: string | number | false;
}

const LOOPBACK = /^(127\.\d+\.\d+\.\d+|::1|localhost)$/;

/**
 * The database URL: DATABASE_URL when set, otherwise the cluster that the start and
 * test scripts made (`.data/pg-url`, the least-privilege role) with the database SHEETKEEPER_DB.
 */
export function databaseUrl(): string {
  if (process.env.DATABASE_URL) return process.env.DATABASE_URL;
  const base = clusterUrl('app');
  if (!base) throw new Error('No database: set DATABASE_URL, or run `npm start` once to create the local cluster.');
  return `${base}/${process.env.SHEETKEEPER_DB ?? 'sheetkeeper'}`;
}

/**
 * A stable secret kept in `.data/` so sessions survive restarts; SESSION_SECRET wins. Readable by
 * its owner only: created 0600, and one left wider by an older version is narrowed on start.
 */
function sessionSecret(): string {
  if (process.env.SESSION_SECRET) return process.env.SESSION_SECRET;
  const file = path.join(DATA_DIR, 'session-secret');
  if (!existsSync(file)) {
    mkdirSync(DATA_DIR, { recursive: true });
    writeFileSync(file, randomBytes(32).toString('hex'), { mode: 0o600 });
  }
  chmodSync(file, 0o600);
  return readFileSync(file, 'utf8').trim();
}

function portFrom(variable: string, fallback: number): number {
  const port = Number(process.env[variable] ?? fallback);
  if (!Number.isInteger(port) || port < 0 || port > 65535)
    throw new Error(`${variable} is not a port: ${process.env[variable]}`);
  return port;
}

export function loadConfig(): ServerConfig {
  const host = process.env.SHEETKEEPER_HOST ?? '127.0.0.1';
  if (!LOOPBACK.test(host)) throw new Error(`SHEETKEEPER_HOST must be a loopback address, got ${host}`);
  const port = portFrom('SHEETKEEPER_PORT', 8460);
  const appUrl = (process.env.SHEETKEEPER_APP_URL ?? `http://${host}:${port}`).replace(/\/$/, '');
  return {
    host,
    port,
    databaseUrl: databaseUrl(),
    sessionSecret: sessionSecret(),
    secureCookies: process.env.SHEETKEEPER_SECURE_COOKIES === '1',
    // SHEETKEEPER_WEB_DIR lets a second export (scripts/e2e.sh) be served beside the main one.
    webDir: process.env.SHEETKEEPER_WEB_DIR ?? path.join(PROJECT_ROOT, 'dist'),
    smtpPort: portFrom('SHEETKEEPER_SMTP_PORT', 8525),
    fakeSmtp: process.env.SHEETKEEPER_FAKE_SMTP !== '0',
    workers: Math.max(0, Number(process.env.SHEETKEEPER_WORKERS ?? 1) || 0),
    workerTargets: workerTargetsFrom(process.env.SHEETKEEPER_WORKER_TARGETS),
    appUrl,
    referenceCacheDir: process.env.SHEETKEEPER_REFERENCE_CACHE ?? path.join(DATA_DIR, 'reference-cache'),
    targetCacheDir: targetCacheDir(),
    allowedOrigins: ownOrigins(appUrl, port, process.env.SHEETKEEPER_ORIGINS),
    trustProxy: trustProxyFrom(process.env.SHEETKEEPER_TRUST_PROXY),
  };
}

/** Unset: every target. Set: its comma-separated names or prefixes, of which there must be one. */
function workerTargetsFrom(value: string | undefined): string[] | null {
  if (value === undefined) return null;
  const patterns = value
    .split(',')
    .map((p) => p.trim())
    .filter((p) => p !== '');
  if (patterns.length === 0)
    throw new Error('SHEETKEEPER_WORKER_TARGETS names no target: give target names or name prefixes, comma-separated');
  return patterns;
}

/** Express reads a number as a count of hops and a string as addresses or names ('loopback', '10.0.0.0/8'). */
function trustProxyFrom(value: string | undefined): string | number | false {
  const trimmed = value?.trim() ?? '';
  if (trimmed === '' || trimmed === '0' || trimmed === 'false') return false;
  return /^\d+$/.test(trimmed) ? Number(trimmed) : trimmed;
}
