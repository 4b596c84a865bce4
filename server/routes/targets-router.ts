import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { discoverTargets } from '../../harness';
import { ROLES } from '../../shared/roles';
import type { TargetEntry } from '../../shared/target-entry';
import { TargetRow } from '../entities/target-row';
import { requireRole } from '../middleware/require-role';

/**
 * The targets this server has seen, installed ones first, each installed one with its entries
 * (shared/target-entry.ts). Entries come from the adapters, not the table: discovery loads no
 * library and is read once per router (~20 ms, Python started once).
 */
export function targetsRouter(dataSource: DataSource): Router {
  const router = Router();
  let entriesByName: Map<string, TargetEntry[]> | null = null;
  const entriesOf = (name: string): TargetEntry[] | undefined => {
    entriesByName ??= new Map(discoverTargets().map((t) => [t.name, t.entries ?? []]));
    return entriesByName.get(name);
  };
  router.get('/', requireRole(...ROLES), async (_req, res) => {
    const targets = await dataSource
      .getRepository(TargetRow)
      .find({ order: { installed: 'DESC', library: 'ASC', name: 'ASC' } });
    res.json({
      targets: targets.map(({ name, library, version, settings, installed }) => {
        const entries = installed ? entriesOf(name) : undefined;
        return { name, library, version, settings, installed, ...(entries ? { entries } : {}) };
      }),
    });
  });
  return router;
}
