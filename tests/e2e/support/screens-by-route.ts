import type { Role } from '../../../shared/roles';

/** Reads the API as the signed-in page does (its cookie), for the seeded ids of dynamic routes. */
export type ApiReader = <T>(path: string) => Promise<T>;

export interface ScreenVisit {
  /** Who meets this screen in a working day; `null` for a visitor who is signed out. */
  role: Role | null;
  /** The address to open, from seeded data where the route is dynamic. */
  path: (api: ApiReader) => Promise<string>;
  /** The browser tab's title the screen must set. */
  title: RegExp;
}

const named = (words: string) => new RegExp(`^${words} · Sheetkeeper$`);
const first = async <T>(api: ApiReader, path: string, key: string): Promise<T> => {
  const list = ((await api<Record<string, T[]>>(path))[key] ?? []) as T[];
  if (list.length === 0) throw new Error(`the seed has nothing at ${path}`);
  return list[0]!;
};
const installedTarget = async (api: ApiReader) =>
  (await api<{ targets: { name: string; library: string; installed: boolean }[] }>('/targets')).targets.find(
    (t) => t.installed,
  )!;

/**
 * Every route file under app/ (its path from app/, without the extension; layouts aside) with the
 * role that meets it, how to reach it, and its tab title. tests/e2e/day-access.test.ts checks each
 * one and fails when a route file has no entry here: a new screen adds its line.
 */
export const SCREENS_BY_ROUTE: Record<string, ScreenVisit> = {
  'sign-in': { role: null, path: async () => '/sign-in', title: named('Sign in') },
  '+not-found': { role: null, path: async () => '/no-such-screen', title: named('No page here') },
  join: { role: null, path: async () => '/join', title: named('Join or reset password') },
  '(signed-in)/index': { role: 'maintainer', path: async () => '/', title: named('Overview') },
  '(signed-in)/runs/index': { role: 'maintainer', path: async () => '/runs', title: named('Runs') },
  '(signed-in)/runs/[id]': {
    role: 'maintainer',
    path: async (api) => `/runs/${(await first<{ id: string }>(api, '/runs?limit=1', 'runs')).id}`,
    title: /^Run [0-9a-f]{8} of .+ · Sheetkeeper$/,
  },
  '(signed-in)/failures/index': { role: 'maintainer', path: async () => '/failures', title: named('Failures') },
  '(signed-in)/failures/[id]': {
    role: 'maintainer',
    path: async (api) => `/failures/${(await first<{ id: string }>(api, '/failures?limit=1', 'failures')).id}`,
    title: /^Failure #\d+ · Sheetkeeper$/,
  },
  '(signed-in)/suites/index': { role: 'contributor', path: async () => '/suites', title: named('Suites') },
  '(signed-in)/suites/new': { role: 'contributor', path: async () => '/suites/new', title: named('New suite') },
  '(signed-in)/suites/[slug]/index': {
    role: 'contributor',
    path: async (api) => `/suites/${(await first<{ slug: string }>(api, '/suites', 'suites')).slug}`,
    title: /^Suite .+ · Sheetkeeper$/,
  },
  '(signed-in)/suites/[slug]/edit': {
    role: 'contributor',
    path: async (api) => `/suites/${(await first<{ slug: string }>(api, '/suites', 'suites')).slug}/edit`,
    title: /^Edit .+ · Sheetkeeper$/,
  },
  '(signed-in)/review/index': { role: 'reviewer', path: async () => '/review', title: named('Review') },
  '(signed-in)/review/[slug]': {
    role: 'reviewer',
    path: async (api) => `/review/${(await first<{ slug: string }>(api, '/suites', 'suites')).slug}`,
    title: /^Review: .+ · Sheetkeeper$/,
  },
  '(signed-in)/decisions/index': { role: 'maintainer', path: async () => '/decisions', title: named('Decisions') },
  '(signed-in)/libraries/index': { role: 'maintainer', path: async () => '/libraries', title: named('Libraries') },
  '(signed-in)/libraries/target': {
    role: 'maintainer',
    path: async (api) => `/libraries/target?name=${encodeURIComponent((await installedTarget(api)).name)}`,
    title: /^.+@.+ · Sheetkeeper$/,
  },
  '(signed-in)/libraries/versions': {
    role: 'maintainer',
    path: async (api) => `/libraries/versions?library=${encodeURIComponent((await installedTarget(api)).library)}`,
    title: /^.+: version matrix · Sheetkeeper$/,
  },
  '(signed-in)/libraries/cut-map': {
    role: 'maintainer',
    path: async (api) => `/libraries/cut-map?name=${encodeURIComponent((await installedTarget(api)).name)}&fn=sqrt`,
    title: /^Cut map of sqrt on .+ · Sheetkeeper$/,
  },
  '(signed-in)/plans/index': { role: 'maintainer', path: async () => '/plans', title: named('Plans') },
  '(signed-in)/plans/new': { role: 'maintainer', path: async () => '/plans/new', title: named('New plan') },
  '(signed-in)/plans/[id]': {
    role: 'maintainer',
    path: async (api) => `/plans/${(await first<{ id: string }>(api, '/plans', 'plans')).id}`,
    title: /^Plan .+ · Sheetkeeper$/,
  },
  '(signed-in)/settings': { role: 'maintainer', path: async () => '/settings', title: named('Settings') },
  '(signed-in)/more': { role: 'maintainer', path: async () => '/more', title: named('More') },
  '(signed-in)/users': { role: 'admin', path: async () => '/users', title: named('Users') },
  '(signed-in)/outbox': { role: 'admin', path: async () => '/outbox', title: named('Outbox') },
  '(signed-in)/outbox/[id]': {
    role: 'admin',
    path: async (api) => `/outbox/${(await first<{ id: string }>(api, '/outbox?limit=1', 'messages')).id}`,
    title: /^Message: .+ · Sheetkeeper$/,
  },
};
