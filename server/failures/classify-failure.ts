import type { DataSource } from 'typeorm';
import type { ClassifyBody } from '../../shared/schemas/classify-body';
import { Deviation } from '../entities/deviation';
import type { User } from '../entities/user';
import { HttpError } from '../http/http-error';
import { targetKeySql } from '../sql/target-key-sql';

/** Records a reviewer's verdict on a failure, scoped from that failure's suite, path, point, diagnosis, target and its version. */
export async function classifyFailure(
  dataSource: DataSource,
  user: User,
  failureId: string,
  body: ClassifyBody,
): Promise<Deviation> {
  const [f] = await dataSource.query(
    `SELECT id::text, suite_slug, path_name, target_version, point_key, diagnosis_kind, ${targetKeySql('target_name')} AS target_key FROM failures WHERE id = $1`,
    [failureId],
  );
  if (!f) throw new HttpError(404, { kind: 'not-found', message: 'No failure with that number.' });
  if (body.scope === 'diagnosis' && !f.diagnosis_kind)
    throw new HttpError(409, {
      kind: 'conflict',
      message: 'This failure has no diagnosis (it is an error or was skipped); choose another scope.',
    });
  return dataSource.getRepository(Deviation).save({
    classification: body.classification,
    scope: body.scope,
    versions: body.versions,
    targetKey: f.target_key,
    targetVersion: f.target_version,
    suiteSlug: f.suite_slug,
    pathName: body.scope === 'path' ? f.path_name : null,
    pointKey: body.scope === 'point' ? f.point_key : null,
    diagnosisKind: body.scope === 'diagnosis' ? f.diagnosis_kind : null,
    reason: body.reason,
    expiresAt: body.expiresAt ? new Date(body.expiresAt) : null,
    failureId: f.id,
    createdBy: user,
    revokedAt: null,
  });
}
