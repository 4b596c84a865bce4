import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import type { RunMatrixCell } from '../../shared/run-matrix-cell';
import type { RunPropertyRow } from '../../shared/run-property-row';
import { idParams } from '../../shared/schemas/id-params';
import { runBody } from '../../shared/schemas/run-body';
import { runListQuery } from '../../shared/schemas/run-list-query';
import { declareRoute } from '../http/declare-route';
import type { RunService } from '../runs/run-service';
import { noWorkerHasTargetSql } from '../sql/no-worker-has-target-sql';
import { SKIP_REASONS_SQL } from '../sql/skip-reasons-sql';
import { PLAN_ROLES } from '../../shared/plan-roles';

/** Runs: everyone reads them and their matrix; maintainers (and admins) start and cancel them. */
export function runsRouter(dataSource: DataSource, runs: RunService): Router {
  const router = Router();
  const noRun = { 404: 'No run with that id.' };

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'A page of runs, newest first, with filters',
      access: ROLES,
      query: runListQuery,
      responses: { 200: 'The runs and the cursor of the next page.' },
    },
    async (_req, res, { query }) => {
      res.json(await runs.list(query));
    },
  );
  declareRoute(
    router,
    'post',
    '/',
    {
      summary: "Start a run of a plan (or answer the plan's run already queued or running)",
      access: PLAN_ROLES,
      body: runBody,
      responses: {
        202: 'The run is queued (`run`, `existing: false`).',
        200: "The plan's run already queued or running (`run`, `existing: true`).",
        404: 'No plan with that id.',
        409: 'The plan has nothing to run (no approved suite or no installed target).',
      },
    },
    async (req, res, { body: { planId } }) => {
      // 202 for a run queued now; 200 with `existing: true` for the plan's run already queued or running.
      const { run, existing } = await runs.start(planId, res.locals.viaToken ? 'api' : 'manual', req.user!);
      res.status(existing ? 200 : 202).json({ run, existing });
    },
  );
  declareRoute(
    router,
    'get',
    '/:id',
    {
      summary: 'One run with its counts',
      access: ROLES,
      params: idParams,
      responses: { 200: 'The run (`run`).', ...noRun },
    },
    async (_req, res, { params }) => {
      res.json({ run: await runs.get(params.id) });
    },
  );
  declareRoute(
    router,
    'post',
    '/:id/cancel',
    {
      summary: 'Cancel a queued or running run; shards not yet done are skipped',
      access: PLAN_ROLES,
      params: idParams,
      responses: { 200: 'The cancelled run (`run`).', ...noRun, 409: 'The run has finished already.' },
    },
    async (_req, res, { params }) => {
      res.json({ run: await runs.cancel(params.id) });
    },
  );
  /** Suite × target → counts, with what each pair checked, the worker that ran it, and whether it waits for one. */
  declareRoute(
    router,
    'get',
    '/:id/matrix',
    {
      summary:
        'A run as suite × target cells with their counts, what each pair checked, its worker and whether it waits for one',
      access: ROLES,
      params: idParams,
      responses: { 200: 'The cells (`cells`).', ...noRun },
    },
    async (_req, res, { params: { id } }) => {
      await runs.assertExists(id);
      const cells: RunMatrixCell[] = await dataSource.query(
        `SELECT s.suite_slug AS "suite", s.target_name AS "target", s.status, s.outcome, s.counts, s.by_class AS "byClass",
                s.by_diagnosis AS "byDiagnosis", s.checked, s.errors, ${SKIP_REASONS_SQL} AS "skipReasons",
                w.label AS "worker", ${noWorkerHasTargetSql('s')} AS "noWorkerHasTarget",
                coalesce(laws.failed, 0) AS "lawsFailed", coalesce(loops.failed, '{}') AS "loopsFailed"
           FROM shards s LEFT JOIN workers w ON w.id = s.worker_id
           -- Grouped once per run through the run_id indexes, not looked up cell by cell.
           LEFT JOIN (SELECT shard_id, count(*)::int AS failed FROM property_results
                       WHERE run_id = $1 AND outcome->>'kind' = 'failed' GROUP BY shard_id) laws ON laws.shard_id = s.id
           LEFT JOIN (SELECT shard_id, array_agg(path_name ORDER BY path_name) AS failed FROM path_summaries
                       WHERE run_id = $1 AND (monodromy->>'pass')::boolean = false GROUP BY shard_id) loops ON loops.shard_id = s.id
          WHERE s.run_id = $1 ORDER BY s.suite_slug, s.target_name`,
        [id],
      );
      res.json({ cells });
    },
  );
  /** The property checks of a run: law, seed, and for failures the replay path and shrunk counterexample. */
  declareRoute(
    router,
    'get',
    '/:id/properties',
    {
      summary: 'The property checks of a run: law, seed, and for failures the replay path and shrunk counterexample',
      access: ROLES,
      params: idParams,
      responses: { 200: 'The property results (`properties`).', ...noRun },
    },
    async (_req, res, { params: { id } }) => {
      await runs.assertExists(id);
      const rows: RunPropertyRow[] = await dataSource.query(
        `SELECT s.suite_slug AS "suite", s.target_name AS "target", p.outcome FROM property_results p JOIN shards s ON s.id = p.shard_id WHERE p.run_id = $1 ORDER BY s.suite_slug, s.target_name, p.law`,
        [id],
      );
      res.json({ properties: rows });
    },
  );
  return router;
}
