import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { idParams } from '../../shared/schemas/id-params';
import { targetSource } from '../../shared/target-source';
import { TargetSourceRow } from '../entities/target-source-row';
import { HttpError } from '../http/http-error';
import { declareRoute } from '../http/declare-route';
import { TARGET_NAMES_LOCK_SQL } from '../targets/target-names-lock-sql';
import type { TargetSourceResolver } from '../targets/target-source-resolver';
import { toTargetSourceView } from '../views/to-target-source-view';

/**
 * Targets added by admins (docs/libraries-screen.md). Every signed-in role sees the list; only
 * admins add (the body is one shared/target-source.ts source; a `local` path or a `program` names
 * files and commands on the server machine) and remove. Adding answers 202 at once: the row is
 * stored `resolving` and the resolver installs or describes the source in the background.
 * Removing marks its targets not installed; runs, failures and plans keep their names.
 */
export function targetSourcesRouter(dataSource: DataSource, resolver: TargetSourceResolver): Router {
  const router = Router();
  const rows = dataSource.getRepository(TargetSourceRow);
  const viewOf = async (id: string) =>
    toTargetSourceView(await rows.findOneOrFail({ where: { id }, relations: { addedBy: true } }));

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'Targets added by admins, newest first, each with its state (resolving, ready, failed) and who added it',
      access: ROLES,
      responses: { 200: 'The added target sources (`sources`).' },
    },
    async (_req, res) => {
      const all = await rows.find({ relations: { addedBy: true }, order: { addedAt: 'DESC', id: 'ASC' } });
      res.json({ sources: all.map(toTargetSourceView) });
    },
  );

  declareRoute(
    router,
    'post',
    '/',
    {
      summary:
        'Add a target (an npm version, a local folder or tarball on the server, or a stdio program); resolved in the background',
      access: ['admin'],
      body: targetSource,
      responses: {
        202: 'Stored and being resolved (`source`, state `resolving`).',
        409: 'The same source is added already.',
      },
    },
    async (req, res, { body: source }) => {
      // One statement: the unique jsonb constraint answers a second add of the same source (any key order).
      const inserted: { id: string }[] = await dataSource.query(
        `INSERT INTO target_sources (source, added_by) VALUES ($1::jsonb, $2)
       ON CONFLICT ON CONSTRAINT target_sources_source_unique DO NOTHING RETURNING id`,
        [JSON.stringify(source), req.user!.id],
      );
      if (inserted.length === 0)
        throw new HttpError(409, { kind: 'conflict', message: 'This source is added already: see the list below.' });
      const id = inserted[0]!.id;
      resolver.later(id);
      res.status(202).json({ source: await viewOf(id) });
    },
  );

  declareRoute(
    router,
    'delete',
    '/:id',
    {
      summary: 'Remove an added target; its targets are marked not installed, runs and failures keep their names',
      access: ['admin'],
      params: idParams,
      responses: { 204: 'Removed.', 404: 'No added target source with that id.' },
    },
    async (_req, res, { params: { id } }) => {
      const found = await dataSource.transaction(async (tx) => {
        await tx.query(TARGET_NAMES_LOCK_SQL);
        const [deleted]: { targets: { name: string }[] }[][] = await tx.query(
          `DELETE FROM target_sources WHERE id = $1 RETURNING targets`,
          [id],
        );
        if (!deleted || deleted.length === 0) return false;
        // Names are unique across ready sources and the built-in targets (the resolver refuses a clash).
        await tx.query(`UPDATE targets SET installed = false WHERE name = ANY($1::text[])`, [
          deleted[0]!.targets.map((t) => t.name),
        ]);
        return true;
      });
      if (!found) throw new HttpError(404, { kind: 'not-found', message: 'No added target source with that id.' });
      res.status(204).end();
    },
  );

  return router;
}
