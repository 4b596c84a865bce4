import type { DecisionView } from '../../shared/decision-view';

const day = (iso: string) => iso.slice(0, 10);

/**
 * Where a decision stands, in words with its day: "in force until 2027-01-31", "expired on
 * 2026-11-30: no longer applies", "revoked on 2026-12-05: no longer applies". Days are UTC, the
 * days the expiry was given in.
 */
export function decisionStateWords(d: Pick<DecisionView, 'state' | 'expiresAt' | 'revokedAt'>): string {
  if (d.state === 'revoked') return `revoked on ${day(d.revokedAt ?? '')}: no longer applies`;
  if (d.state === 'expired') return `expired on ${day(d.expiresAt ?? '')}: no longer applies`;
  return d.expiresAt ? `in force until ${day(d.expiresAt)}` : 'in force, no expiry';
}
