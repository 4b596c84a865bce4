import bcrypt from 'bcryptjs';

/**
 * bcrypt cost 11: measured here at ~150 ms per hash with bcryptjs (pure JS), which
 * keeps a sign-in under a quarter second while staying above the cost-10 floor.
 */
export const PRODUCTION_BCRYPT_COST = 11;

/**
 * The cost new hashes get. Under test (NODE_ENV=test: jest sets it, and scripts/test.sh sets it
 * for the end-to-end seed and server; nothing else here does) it is bcrypt's minimum, 4, as is
 * common practice for test suites: the node tests sign in and fail sign-ins thousands of times
 * (at cost 11 bcrypt was 7.7 s of the fuzz's ~40 s of CPU), and the end-to-end journeys ~35 times
 * (6 s of the e2e server's 21 s). A hash carries its own cost, so verifying works the same at
 * either; `npm start` and every real process use cost 11.
 */
export const BCRYPT_COST = process.env.NODE_ENV === 'test' ? 4 : PRODUCTION_BCRYPT_COST;

/**
 * A hash of a random password, compared against when the account is unknown so both answers take
 * as long. Made on the first sign-in, not at import: every process and test file that loads the
 * server paid ~190 ms of bcrypt at start-up for it. Both answers wait for it, so the first one
 * tells nothing either.
 */
let decoyHash: Promise<string> | null = null;
const decoy = () => (decoyHash ??= bcrypt.hash(`decoy-${Math.random()}`, BCRYPT_COST));

export const passwords = {
  hash: (plain: string): Promise<string> => bcrypt.hash(plain, BCRYPT_COST),
  verify: async (plain: string, hash: string | undefined): Promise<boolean> => {
    const against = hash ?? (await decoy());
    if (hash !== undefined) await decoy();
    return (await bcrypt.compare(plain, against)) && hash !== undefined;
  },
};
