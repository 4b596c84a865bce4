import type { DataSource } from 'typeorm';
import { Deviation } from '../entities/deviation';
import { User } from '../entities/user';
import { targetKeySql } from '../sql/target-key-sql';

/** A day in milliseconds. */
const DAY = 86_400_000;

/**
 * Two decisions on the demo runs' failures, so the Decisions screen has a story on a fresh
 * `npm start` (invented): Hanne, a reviewer, called one path's failures on the newest complex.js a
 * bug reported upstream, for that version and later ones; Kwame had accepted a path's failures on
 * the earlier release as a deviation, which has since expired and stays listed as expired. Neither
 * keeps a failure out of regressions (a bug verdict never does; an expired deviation no longer
 * does), so the demo's regression counts are the runs' own. Does nothing without failures.
 */
export async function seedDemoDecisions(dataSource: DataSource): Promise<number> {
  const users = dataSource.getRepository(User);
  const hanne = await users.findOneBy({ email: 'hanne@sheetkeeper.test' });
  const kwame = await users.findOneBy({ email: 'kwame@sheetkeeper.test' });
  if (!hanne || !kwame) return 0;
  const failures: { id: string; suite_slug: string; path_name: string; target_key: string; target_version: string }[] =
    await dataSource.query(
      `SELECT DISTINCT ON (r.created_at) f.id::text, f.suite_slug, f.path_name, f.target_version,
              ${targetKeySql('f.target_name')} AS target_key
         FROM failures f JOIN runs r ON r.id = f.run_id
        WHERE f.outcome_kind = 'fail' AND f.finding_class = 'branch'
        ORDER BY r.created_at DESC, f.id`,
    );
  const [newest, earlier] = failures;
  if (!newest) return 0;
  const deviations = dataSource.getRepository(Deviation);
  const now = Date.now();
  await deviations.save({
    classification: 'bug',
    scope: 'path',
    versions: 'this-and-later',
    targetKey: newest.target_key,
    targetVersion: newest.target_version,
    suiteSlug: newest.suite_slug,
    pathName: newest.path_name,
    pointKey: null,
    diagnosisKind: null,
    reason: 'Reported upstream with the reproducer from this case; the maintainers confirmed the lost zero sign.',
    expiresAt: null,
    failureId: newest.id,
    createdBy: hanne,
    revokedAt: null,
  });
  if (!earlier) return 1;
  await deviations.save({
    classification: 'accepted',
    scope: 'path',
    versions: 'this-version',
    targetKey: earlier.target_key,
    targetVersion: earlier.target_version,
    suiteSlug: earlier.suite_slug,
    pathName: earlier.path_name,
    pointKey: null,
    diagnosisKind: null,
    reason: 'Lived with on the old release until the upgrade; not meant to outlast it.',
    createdAt: new Date(now - 40 * DAY),
    expiresAt: new Date(now - 10 * DAY),
    failureId: earlier.id,
    createdBy: kwame,
    revokedAt: null,
  });
  return 2;
}
