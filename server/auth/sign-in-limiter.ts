import type { Pool } from 'pg';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';

export interface SignInLimits {
  /** Failed attempts allowed for one account from one address before it is blocked. */
  perAccountAndAddress: number;
  /** Failed attempts allowed from one address over all accounts. */
  perAddress: number;
  /** Window (and block time) in seconds. */
  windowSeconds: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = {
  perAccountAndAddress: 10,
  perAddress: 100,
  windowSeconds: 15 * 60,
};

/**
 * Counts failed sign-ins in PostgreSQL (so several server processes share the
 * counts), per account and address and per address alone. A success clears the
 * account's count for that address.
 */
export class SignInLimiter {
  private readonly byAccount: RateLimiterPostgres;
  private readonly byAddress: RateLimiterPostgres;

  constructor(pool: Pool, limits: SignInLimits = DEFAULT_SIGN_IN_LIMITS) {
    const common = {
      storeClient: pool,
      storeType: 'pool',
      tableName: 'sign_in_limits',
      tableCreated: true,
      duration: limits.windowSeconds,
      blockDuration: limits.windowSeconds,
      clearExpiredByTimeout: false,
    };
    this.byAccount = new RateLimiterPostgres({ ...common, keyPrefix: 'account', points: limits.perAccountAndAddress });
    this.byAddress = new RateLimiterPostgres({ ...common, keyPrefix: 'address', points: limits.perAddress });
  }

  /** Seconds to wait before another attempt is allowed, or 0 when one is allowed now. */
  async retryAfter(email: string, address: string): Promise<number> {
    const [account, addr] = await Promise.all([this.byAccount.get(`${email}|${address}`), this.byAddress.get(address)]);
    const waits = [account, addr]
      .filter((r): r is RateLimiterRes => r !== null && r.remainingPoints <= 0 && r.msBeforeNext > 0)
      .map((r) => Math.ceil(r.msBeforeNext / 1000));
    return waits.length > 0 ? Math.max(...waits) : 0;
  }

  async recordFailure(email: string, address: string): Promise<void> {
    // consume() rejects with a RateLimiterRes once the budget is spent; the count is kept either way.
    await Promise.all([
      this.byAccount.consume(`${email}|${address}`).catch(rejectUnlessLimit),
      this.byAddress.consume(address).catch(rejectUnlessLimit),
    ]);
  }

  async recordSuccess(email: string, address: string): Promise<void> {
    await this.byAccount.delete(`${email}|${address}`);
  }
}

function rejectUnlessLimit(reason: unknown): void {
  if (!(reason instanceof RateLimiterRes)) throw reason;
}
