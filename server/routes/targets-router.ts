import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { installedTargets } from '../../harness';
import { ROLES } from '../../shared/roles';
import type { TargetIdentity } from '../../shared/target-identity';
import { TargetRow } from '../entities/target-row';
import { declareRoute } from '../http/declare-route';
import { readyTargetSources } from '../targets/ready-target-sources';

/**
 * The targets this server has seen, installed ones first, each installed one with its entries
 * (shared/target-entry.ts) and the convention it states on its cuts, if any. Entries come from the adapters, not the table:
 * `installedTargets()` discovers them once per process (it loads no library); an admin-added
 * target's come from what its program described, stored with its source.
 */
export function targetsRouter(dataSource: DataSource): Router {
  const router = Router();
  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'The targets this server has seen, installed ones first, each installed one with its entries',
      access: ROLES,
      responses: { 200: 'The targets (`targets`).' },
    },
    async (_req, res) => {
      const targets = await dataSource
        .getRepository(TargetRow)
        .find({ order: { installed: 'DESC', library: 'ASC', name: 'ASC' } });
      const discovered = new Map<string, Pick<TargetIdentity, 'entries' | 'convention'>>(
        installedTargets().map((t) => [t.name, { entries: t.entries ?? [], convention: t.convention }]),
      );
      const added = new Map(
        (await readyTargetSources(dataSource.manager)).flatMap((s) =>
          s.targets.map((t) => [t.name, { entries: t.entries, convention: t.convention }] as const),
        ),
      );
      res.json({
        targets: targets.map(({ name, library, version, settings, installed }) => {
          const known = installed ? (discovered.get(name) ?? added.get(name)) : undefined;
          return {
            name,
            library,
            version,
            settings,
            installed,
            ...(known?.entries ? { entries: known.entries } : {}),
            ...(known?.convention ? { convention: known.convention } : {}),
          };
        }),
      });
    },
  );
  return router;
}
