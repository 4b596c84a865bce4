import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import type { RunPropertyRow } from '../../shared/run-property-row';
import { idParams } from '../../shared/schemas/id-params';
import { runBody } from '../../shared/schemas/run-body';
import { runListQuery } from '../../shared/schemas/run-list-query';
import { requireRole } from '../middleware/require-role';
import { parseInput } from '../http/parse-input';
import type { RunService } from '../runs/run-service';

/** Runs: everyone reads them and their matrix; maintainers (and admins) start and cancel them. */
export function runsRouter(dataSource: DataSource, runs: RunService): Router {
  const router = Router();
  const anyone = requireRole(...ROLES);
  const runners = requireRole('maintainer', 'admin');

  router.get('/', anyone, async (req, res) => {
    res.json(await runs.list(parseInput(runListQuery, req.query, 'query')));
  });
  router.post('/', runners, async (req, res) => {
    const { planId } = parseInput(runBody, req.body, 'body');
    // 202 for a run queued now; 200 with `existing: true` for the plan's run already queued or running.
    const { run, existing } = await runs.start(planId, res.locals.viaToken ? 'api' : 'manual', req.user!);
    res.status(existing ? 200 : 202).json({ run, existing });
  });
  router.get('/:id', anyone, async (req, res) => {
    res.json({ run: await runs.get(parseInput(idParams, req.params, 'params').id) });
  });
  router.post('/:id/cancel', runners, async (req, res) => {
    res.json({ run: await runs.cancel(parseInput(idParams, req.params, 'params').id) });
  });
  /** Suite × target → counts, with what each pair checked. */
  router.get('/:id/matrix', anyone, async (req, res) => {
    const { id } = parseInput(idParams, req.params, 'params');
    await runs.get(id);
    const cells: RunMatrixCell[] = await dataSource.query(
      `SELECT suite_slug AS "suite", target_name AS "target", status, outcome, counts, by_class AS "byClass", by_diagnosis AS "byDiagnosis", checked, errors
         FROM shards WHERE run_id = $1 ORDER BY suite_slug, target_name`,
      [id],
    );
    res.json({ cells });
  });
  /** The property checks of a run: law, seed, and for failures the replay path and shrunk counterexample. */
  router.get('/:id/properties', anyone, async (req, res) => {
    const { id } = parseInput(idParams, req.params, 'params');
    await runs.get(id);
    const rows: RunPropertyRow[] = await dataSource.query(
      `SELECT s.suite_slug AS "suite", s.target_name AS "target", p.outcome FROM property_results p JOIN shards s ON s.id = p.shard_id WHERE p.run_id = $1 ORDER BY s.suite_slug, s.target_name, p.law`,
      [id],
    );
    res.json({ properties: rows });
  });
  return router;
}
