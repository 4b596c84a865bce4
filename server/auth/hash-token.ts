import { createHash } from 'node:crypto';

/** SHA-256 of a token, hex. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
