import { stringify } from 'csv-stringify/sync';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { FAILURE_ROW_FIELDS } from '../../shared/failure-row-fields';
import type { FailureView } from '../../shared/failure-view';
import { ROLES } from '../../shared/roles';
import { classifyBody } from '../../shared/schemas/classify-body';
import { failureIdParams } from '../../shared/schemas/failure-id-params';
import { failureQuery } from '../../shared/schemas/failure-query';
import { requireRole } from '../middleware/require-role';
import { classifyFailure } from '../failures/classify-failure';
import { failurePath } from '../failures/failure-path';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { parseInput } from '../http/parse-input';
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
  const anyone = requireRole(...ROLES);

  router.get('/', anyone, async (req, res) => {
    res.type('json').send(await failurePageJson(dataSource, parseInput(failureQuery, req.query, 'query')));
  });

  router.get('/export.csv', anyone, async (req, res) => {
    const q = { ...parseInput(failureQuery, req.query, 'query'), limit: CSV_MAX_ROWS };
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
  });

  // Maintainers live with their library's deviations, so they may accept one; calling a
  // failure a bug or a convention difference stays a reviewer's (or admin's) judgement.
  router.post('/:id/classify', requireRole('reviewer', 'admin', 'maintainer'), async (req, res) => {
    const id = parseInput(failureIdParams, req.params, 'params').id;
    const body = parseInput(classifyBody, req.body, 'body');
    if (req.user!.role === 'maintainer' && body.classification !== 'accepted') {
      throw new HttpError(403, {
        kind: 'forbidden',
        message:
          'A maintainer may accept a deviation; calling a failure a bug or a convention difference needs the role reviewer or admin.',
      });
    }
    const deviation = await classifyFailure(dataSource, req.user!, id, body);
    res.status(201).json({
      deviation: {
        id: deviation.id,
        classification: deviation.classification,
        scope: deviation.scope,
        expiresAt: deviation.expiresAt?.toISOString() ?? null,
      },
    });
  });

  router.get('/:id/path', anyone, async (req, res) => {
    res.json(
      await failurePath(
        dataSource,
        parseInput(failureIdParams, req.params, 'params').id,
        options.referenceCacheDir ?? null,
      ),
    );
  });

  router.get('/:id', anyone, async (req, res) => {
    const id = parseInput(failureIdParams, req.params, 'params').id;
    const [row] = await dataSource.query(`SELECT point_key, target_name FROM failures WHERE id = $1`, [id]);
    if (!row) throw new HttpError(404, { kind: 'not-found', message: 'No failure with that number.' });
    const { rows } = await searchFailures(dataSource, { sort: 'id', limit: 1 }, true, id);
    const history = await dataSource.query(
      `SELECT f.id::text AS "id", f.run_id AS "runId", r.created_at AS "runAt", f.target_name AS "targetName", f.target_version AS "targetVersion",
              f.diagnosis_kind AS "diagnosisKind", f.is_regression AS "isRegression"
         FROM failures f JOIN runs r ON r.id = f.run_id WHERE f.point_key = $1 ORDER BY r.created_at DESC LIMIT 100`,
      [row.point_key],
    );
    res.json({ failure: rows[0], history });
  });
  return router;
}
