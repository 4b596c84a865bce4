import { stringify } from 'csv-stringify/sync';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { FailureView } from '../../shared/failure-view';
import { ROLES } from '../../shared/roles';
import { classifyBody } from '../../shared/schemas/classify-body';
import { failureIdParams } from '../../shared/schemas/failure-id-params';
import { failureQuery, type FailureQuery } from '../../shared/schemas/failure-query';
import { classifyFailure } from '../failures/classify-failure';
import { decisionsOn } from '../failures/decisions-on';
import { targetKeySql } from '../sql/target-key-sql';
import { toDecisionView } from '../views/to-decision-view';
import { failurePath } from '../failures/failure-path';
import { resolveRunPrefix } from '../failures/resolve-run-prefix';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { declareRoute } from '../http/declare-route';
import { failurePageJson } from '../failures/failure-page-json';
import { searchFailures } from '../failures/failure-search';
import { spreadsheetSafeCell } from '../failures/spreadsheet-safe-cell';

/** The export's cells in order, from the one list of the failure row's fields. */
const CSV_CELLS = FAILURE_ROW_FIELDS.flatMap(
  (f): readonly (readonly [string, (row: FailureView) => string | number, 'text' | 'number'])[] =>
    'csv' in f ? f.csv : [],
);

/** Rows per CSV export: enough for a whole demo run; larger tables are filtered first. */
const CSV_MAX_ROWS = 50_000;

/** The failure table with filters and keyed pages, its CSV export, one failure with its history, and its path for the pictures. */
export function failuresRouter(dataSource: DataSource, options: { referenceCacheDir?: string | null } = {}): Router {
  const router = Router();
  const noFailure = { 404: 'No failure with that number.' };
  /** The query with `run` (a short id or any start of one) turned into the one run it names, or a 400 on `query.run`. */
  const withRunResolved = async (query: FailureQuery): Promise<FailureQuery> =>
    query.run ? { ...query, run: await resolveRunPrefix(dataSource, query.run, 'query.run') } : query;

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'A page of the failure table: branch findings first, then accuracy, then errors and skipped points',
      access: ROLES,
      query: failureQuery,
      responses: { 200: 'The rows and the cursor (`after`) of the next page.' },
    },
    async (_req, res, { query }) => {
      res.type('json').send(await failurePageJson(dataSource, await withRunResolved(query)));
    },
  );

  declareRoute(
    router,
    'get',
    '/export.csv',
    {
      summary: 'The failure table as CSV (needs run, suite or target; at most 50,000 rows)',
      access: ROLES,
      query: failureQuery,
      responses: { 200: { description: 'The CSV file, one row per failure.', mediaType: 'text/csv' } },
    },
    async (_req, res, { query }) => {
      const q = { ...(await withRunResolved(query)), limit: CSV_MAX_ROWS };
      if (!q.run && !q.suite && !q.target)
        throw new InputError([{ field: 'query', rule: 'needs run, suite or target to export' }]);
      const { rows } = await searchFailures(dataSource, q, true);
      const csv = stringify(
        rows.map((r) =>
          Object.fromEntries(CSV_CELLS.map(([header, read, kind]) => [header, spreadsheetSafeCell(read(r), kind)])),
        ),
        { header: true },
      );
      res.type('text/csv').attachment('sheetkeeper-failures.csv').send(csv);
    },
  );

  // Maintainers live with their library's deviations, so they may accept one; calling a
  // failure a bug or a convention difference stays a reviewer's (or admin's) judgement.
  declareRoute(
    router,
    'post',
    '/:id/classify',
    {
      summary:
        'Give a failure a verdict (bug, convention difference or accepted) over a scope and the versions of its library it covers',
      access: ['reviewer', 'admin', 'maintainer'],
      params: failureIdParams,
      body: classifyBody,
      responses: {
        201: 'The verdict (`deviation`).',
        403: 'A maintainer may only accept a deviation.',
        ...noFailure,
        409: 'The failure has no diagnosis (an error or a skipped point), so the diagnosis scope does not apply.',
      },
    },
    async (req, res, { params: { id }, body }) => {
      if (req.user!.role === 'maintainer' && body.classification !== 'accepted') {
        throw new HttpError(403, {
          kind: 'forbidden',
          message:
            'A maintainer may accept a deviation; calling a failure a bug or a convention difference needs the role reviewer or admin.',
        });
      }
      res.status(201).json({ deviation: toDecisionView(await classifyFailure(dataSource, req.user!, id, body)) });
    },
  );

  declareRoute(
    router,
    'get',
    '/:id/path',
    {
      summary: "A failure's path with the library's and the reference's values, for the pictures",
      access: ROLES,
      params: failureIdParams,
      responses: {
        200: 'The path and its values.',
        ...noFailure,
        409: 'The path cannot be built, or has too many points to draw.',
      },
    },
    async (_req, res, { params: { id } }) => {
      res.json(await failurePath(dataSource, id, options.referenceCacheDir ?? null));
    },
  );

  declareRoute(
    router,
    'get',
    '/:id',
    {
      summary: 'One failure with its history at the same point across runs',
      access: ROLES,
      params: failureIdParams,
      responses: {
        200: 'The failure (`failure`), its library and version, up to 100 earlier ones at its point (`history`) and the decisions that apply to it, revoked ones left out (`decisions`).',
        ...noFailure,
      },
    },
    async (_req, res, { params: { id } }) => {
      const [row] = await dataSource.query(
        `SELECT point_key, target_name, target_version, ${targetKeySql('target_name')} AS target_key FROM failures WHERE id = $1`,
        [id],
      );
      if (!row) throw new HttpError(404, { kind: 'not-found', message: 'No failure with that number.' });
      const { rows } = await searchFailures(dataSource, { sort: 'id', limit: 1 }, true, id);
      const history = await dataSource.query(
        `SELECT f.id::text AS "id", f.run_id AS "runId", r.created_at AS "runAt", f.target_name AS "targetName", f.target_version AS "targetVersion",
              f.diagnosis_kind AS "diagnosisKind", f.is_regression AS "isRegression"
         FROM failures f JOIN runs r ON r.id = f.run_id WHERE f.point_key = $1 ORDER BY r.created_at DESC LIMIT 100`,
        [row.point_key],
      );
      const decisions = await decisionsOn(dataSource, id);
      res.json({ failure: rows[0], targetKey: row.target_key, targetVersion: row.target_version, history, decisions });
    },
  );
  return router;
}
