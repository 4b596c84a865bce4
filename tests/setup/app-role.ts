import { pgBaseUrl } from './pg-base-url';

/** The application's role, read from its URL: the owner of every database the tests create. */
export function appRole(): string {
  return decodeURIComponent(new URL(pgBaseUrl()).username);
}
