/**
 * Where a decision stands: `in-force` applies now; `expired` passed its expiry day and applies no
 * more (it stays listed, so nobody wonders where it went); `revoked` was withdrawn by a reviewer.
 */
export type DecisionState = 'in-force' | 'expired' | 'revoked';

/** The state of a decision at `now` from its revocation and expiry instants (ISO strings or null). */
export function decisionState(
  d: { revokedAt: string | null; expiresAt: string | null },
  now: number = Date.now(),
): DecisionState {
  if (d.revokedAt !== null) return 'revoked';
  if (d.expiresAt !== null && Date.parse(d.expiresAt) <= now) return 'expired';
  return 'in-force';
}
