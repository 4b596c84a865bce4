import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { reviewBody } from '../../shared/schemas/review-body';
import { suiteListQuery } from '../../shared/schemas/suite-list-query';
import { uploadFileName } from '../../shared/schemas/upload-file-name';
import { suiteSlugParams, suiteVersionParams } from '../../shared/schemas/suite-slug-params';
import { requireRole } from '../middleware/require-role';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { parseInput } from '../http/parse-input';
import { SuiteService } from '../suites/suite-service';
import { receivedFile } from '../suites/received-file';
import { validateSuiteInput } from '../suites/validate-suite-input';
import type { ReferenceTableChecks } from '../suites/reference-table-checks';
import { SuiteVersion } from '../entities/suite-version';
import { Upload } from '../entities/upload';

/** Suite files are small: the largest demo suite is under 4 KB, so 256 KB leaves room without inviting abuse. */
const MAX_UPLOAD_BYTES = 256 * 1024;

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_UPLOAD_BYTES, files: 1, fields: 4, parts: 6 },
  fileFilter: (_req, file, done) => {
    const badName = fileNameIssue(file.originalname);
    if (badName) return done(badName);
    const json = file.mimetype === 'application/json' || file.originalname.toLowerCase().endsWith('.json');
    if (json) done(null, true);
    else done(new HttpError(415, { kind: 'unsupported-media-type', message: 'A suite file must be JSON (.json).' }));
  },
});

/** Reference tables: up to 5,000 rows of ~120 bytes. */
const MAX_TABLE_BYTES = 1024 * 1024;

const tableUpload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_TABLE_BYTES, files: 1, fields: 4, parts: 6 },
  fileFilter: (_req, file, done) => {
    const badName = fileNameIssue(file.originalname);
    if (badName) return done(badName);
    const csv =
      ['text/csv', 'application/vnd.ms-excel', 'text/plain'].includes(file.mimetype) ||
      file.originalname.toLowerCase().endsWith('.csv');
    if (csv) done(null, true);
    else done(new HttpError(415, { kind: 'unsupported-media-type', message: 'A reference table must be CSV (.csv).' }));
  },
});

/** A bad file name is refused before the file is read (and long before a row could keep it). */
function fileNameIssue(name: string): InputError | null {
  const checked = uploadFileName.safeParse(name);
  return checked.success ? null : new InputError([{ field: 'file.name', rule: checked.error.issues[0]!.message }]);
}

/** multer's own errors are the client's: too large is 413, the rest 400 naming the rule. */
function receiveFile(req: Request, res: Response, next: NextFunction): void {
  receiveWith(upload, MAX_UPLOAD_BYTES, req, res, next);
}

function receiveTable(req: Request, res: Response, next: NextFunction): void {
  receiveWith(tableUpload, MAX_TABLE_BYTES, req, res, next);
}

function receiveWith(m: multer.Multer, maxBytes: number, req: Request, res: Response, next: NextFunction): void {
  m.single('file')(req, res, (err: unknown) => {
    if (err instanceof multer.MulterError) {
      if (err.code === 'LIMIT_FILE_SIZE')
        return next(
          new HttpError(413, { kind: 'payload-too-large', message: `The file may be at most ${maxBytes / 1024} KB.` }),
        );
      return next(new InputError([{ field: err.field ?? 'file', rule: err.message.toLowerCase() }]));
    }
    if (err instanceof InputError || err instanceof HttpError || !(err instanceof Error)) return next(err);
    // Anything else was thrown by busboy reading the body (a NUL in a part header gives "Malformed part
    // header"): the client sent a broken multipart body, which is a 400, not a server error.
    next(new InputError([{ field: 'file', rule: `must be sent as well-formed multipart/form-data (${err.message})` }]));
  });
}

export function suitesRouter(dataSource: DataSource, tables: ReferenceTableChecks): Router {
  const router = Router();
  const suites = new SuiteService(dataSource);
  const anyone = requireRole(...ROLES);

  router.get('/', anyone, async (req, res) => {
    res.json({ suites: await suites.list(parseInput(suiteListQuery, req.query, 'query')) });
  });

  router.get('/:slug', anyone, async (req, res) => {
    const { slug } = parseInput(suiteSlugParams, req.params, 'params');
    res.json({ versions: await suites.versions(slug) });
  });

  router.post('/', anyone, async (req, res) => {
    const body = validateSuiteInput(req.body, 'body', 'the suite');
    const { view } = await suites.save(req.user!, body, 'create');
    res.status(201).json({ version: view });
  });

  router.put('/:slug', anyone, async (req, res) => {
    const { slug } = parseInput(suiteSlugParams, req.params, 'params');
    const body = validateSuiteInput(req.body, 'body', slug);
    if (body.id !== slug)
      throw new InputError([{ field: 'body.id', rule: `must stay "${slug}": a suite keeps its id across versions` }]);
    const { created, view } = await suites.save(req.user!, body, 'edit');
    res.status(created ? 201 : 200).json({ version: view });
  });

  router.post('/upload', anyone, receiveFile, async (req, res) => {
    const file = req.file;
    if (!file) throw new InputError([{ field: 'file', rule: 'is required (a .json suite file in the field "file")' }]);
    const { name, text } = receivedFile(file);
    let data: unknown;
    try {
      data = JSON.parse(text);
    } catch {
      throw new InputError([{ field: 'file', rule: 'must be valid JSON' }]);
    }
    const body = validateSuiteInput(data, 'file', name);
    const { created, view } = await suites.save(req.user!, body, 'upsert');
    await dataSource.getRepository(Upload).save({
      kind: 'suite-file',
      suiteVersion: { id: view.id },
      filename: name,
      bytes: file.size,
      summary: { slug: view.slug, version: view.version, created },
      uploadedBy: req.user!,
    });
    res.status(created ? 201 : 200).json({ version: view });
  });

  /**
   * A CSV of reference values computed elsewhere, checked against our reference for the suite's
   * latest version on a reference-table thread within its time budget (422 over it); the upload
   * is recorded only once the check has answered.
   */
  router.post('/:slug/reference-table', anyone, receiveTable, async (req, res) => {
    const { slug } = parseInput(suiteSlugParams, req.params, 'params');
    const file = req.file;
    if (!file) throw new InputError([{ field: 'file', rule: 'is required (a .csv table in the field "file")' }]);
    const { name, text } = receivedFile(file);
    const version = await dataSource
      .getRepository(SuiteVersion)
      .findOne({ where: { suite: { slug } }, order: { version: 'DESC' } });
    if (!version) throw new HttpError(404, { kind: 'not-found', message: `No suite with the id "${slug}".` });
    const check = await tables.check(version.body, text);
    await dataSource.getRepository(Upload).save({
      kind: 'reference-table',
      suiteVersion: version,
      filename: name,
      bytes: file.size,
      summary: { ...check },
      uploadedBy: req.user!,
    });
    res.json({ suite: slug, version: version.version, check });
  });

  router.post('/:slug/submit', anyone, async (req, res) => {
    const { slug } = parseInput(suiteSlugParams, req.params, 'params');
    res.json({ version: await suites.submit(req.user!, slug) });
  });

  router.post('/:slug/versions/:version/review', requireRole('reviewer', 'admin'), async (req, res) => {
    const { slug, version } = parseInput(suiteVersionParams, req.params, 'params');
    const { decision, comment } = parseInput(reviewBody, req.body, 'body');
    res.json({ version: await suites.review(req.user!, slug, version, decision, comment) });
  });

  router.post('/:slug/versions/:version/retire', requireRole('reviewer', 'maintainer', 'admin'), async (req, res) => {
    const { slug, version } = parseInput(suiteVersionParams, req.params, 'params');
    res.json({ version: await suites.retire(slug, version) });
  });

  return router;
}
