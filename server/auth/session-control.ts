import type { DataSource } from 'typeorm';
import type { User } from '../entities/user';
import type { ShortLivedCache } from './short-lived-cache';

/**
 * What this process keeps of who is signed in (a session row and a user row, each for a moment:
 * create-app.ts) and how a change to an account reaches it. Forgetting a user makes the next
 * request read the row again; ending a user's sessions deletes their rows (found through
 * `sessions_user_idx` on the session's user id) and forgets them here at once. Another server
 * process sees either within its caches' 2 s.
 */
export class SessionControl {
  constructor(
    private readonly dataSource: DataSource,
    private readonly sessionCache: ShortLivedCache<string>,
    private readonly userCache: ShortLivedCache<User>,
  ) {}

  /** The next request of `userId` reads the user row again (a new role, a deactivation). */
  forgetUser(userId: string): void {
    this.userCache.delete(userId);
  }

  /** Ends every session of `userId` but `keepSid` (one the request itself holds, when it should go on). */
  async endSessionsOf(userId: string, keepSid?: string): Promise<void> {
    await this.dataSource.query(
      `DELETE FROM sessions WHERE sess #>> '{passport,user}' = $1 AND sid IS DISTINCT FROM $2`,
      [userId, keepSid ?? null],
    );
    // The cache is keyed by session id; which ids were this user's is not worth a query: clear it.
    this.sessionCache.clear();
    this.forgetUser(userId);
  }
}
