import type { Pool } from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';

export interface SignInLimits {
  /** Failed attempts on one account from one client before that client is blocked for that account. */
  perAccountAndClient: number;
  /** Failed attempts from one client over all accounts before the client is blocked. */
  perClient: number;
  /** Failed attempts on one account from all clients before its attempts are spaced out (never blocked). */
  perAccountBeforeSpacing: number;
  /** Past that, one attempt on the account per this many seconds, whoever makes it. */
  accountSpacingSeconds: number;
  /** Window (and block time) in seconds. */
  windowSeconds: number;
}

/**
 * 10 failures lock one client out of one account for 15 min; 100 lock a client out of all.
 * Past 20 failures on one account from anywhere, the account takes one attempt per 5 s: a
 * brute force spread over many clients gets ≤ 200 guesses per window instead of one per bcrypt
 * compare (290 ms at cost 11, measured on the shared 2-core development machine: ~3,100 per window
 * and server process), while the account's owner waits at most 5 s.
 */
export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = {
  perAccountAndClient: 10,
  perClient: 100,
  perAccountBeforeSpacing: 20,
  accountSpacingSeconds: 5,
  windowSeconds: 15 * 60,
};

/**
 * Counts failed sign-ins in PostgreSQL (so several server processes share the counts) per account
 * and client, per client, and per account. The client is `req.ip`: the peer address, or with
 * `trust proxy` configured the address a trusted proxy forwards. A lock is never per account
 * alone, so failures on one account, from one client or many, never shut its owner (or anyone
 * signing in to another account) out for the window: many failures on one account only space its
 * attempts out. A success clears the count of that account from that client.
 */
export class SignInLimiter {
  private readonly byAccountAndClient: RateLimiterPostgres;
  private readonly byClient: RateLimiterPostgres;
  private readonly byAccount: RateLimiterPostgres;
  private readonly accountSpacing: RateLimiterPostgres;

  constructor(
    pool: Pool,
    private readonly limits: SignInLimits = DEFAULT_SIGN_IN_LIMITS,
  ) {
    const common = {
      storeClient: pool,
      storeType: 'pool',
      tableName: 'sign_in_limits',
      tableCreated: true,
      duration: limits.windowSeconds,
      blockDuration: limits.windowSeconds,
      clearExpiredByTimeout: false,
    };
    this.byAccountAndClient = new RateLimiterPostgres({
      ...common,
      keyPrefix: 'account-client',
      points: limits.perAccountAndClient,
    });
    this.byClient = new RateLimiterPostgres({ ...common, keyPrefix: 'client', points: limits.perClient });
    // Counts only, never blocks: blockDuration 0 and more points than any window can spend.
    this.byAccount = new RateLimiterPostgres({
      ...common,
      keyPrefix: 'account',
      points: Number.MAX_SAFE_INTEGER,
      blockDuration: 0,
    });
    this.accountSpacing = new RateLimiterPostgres({
      ...common,
      keyPrefix: 'account-spacing',
      points: 1,
      duration: limits.accountSpacingSeconds,
      blockDuration: 0,
    });
  }

  /**
   * Seconds to wait before this attempt may go on, or 0 when it may go on now. An attempt on an
   * account past its spacing threshold takes the account's one slot of the spacing period.
   */
  async admit(email: string, client: string): Promise<number> {
    const [pair, all, account] = await Promise.all([
      this.byAccountAndClient.get(`${email}|${client}`),
      this.byClient.get(client),
      this.byAccount.get(email),
    ]);
    const waits = [pair, all]
      .filter((r): r is RateLimiterRes => r !== null && r.remainingPoints <= 0 && r.msBeforeNext > 0)
      .map(seconds);
    if (waits.length > 0) return Math.max(...waits);
    if ((account?.consumedPoints ?? 0) < this.limits.perAccountBeforeSpacing) return 0;
    return this.accountSpacing.consume(email).then(
      () => 0,
      (reason: unknown) => {
        if (reason instanceof RateLimiterRes) return Math.max(1, seconds(reason));
        throw reason;
      },
    );
  }

  async recordFailure(email: string, client: string): Promise<void> {
    // consume() rejects with a RateLimiterRes once the budget is spent; the count is kept either way.
    await Promise.all([
      this.byAccountAndClient.consume(`${email}|${client}`).catch(rejectUnlessLimit),
      this.byClient.consume(client).catch(rejectUnlessLimit),
      this.byAccount.consume(email).catch(rejectUnlessLimit),
    ]);
  }

  async recordSuccess(email: string, client: string): Promise<void> {
    await this.byAccountAndClient.delete(`${email}|${client}`);
  }
}

function seconds(r: RateLimiterRes): number {
  return Math.ceil(r.msBeforeNext / 1000);
}

function rejectUnlessLimit(reason: unknown): void {
  if (!(reason instanceof RateLimiterRes)) throw reason;
}
