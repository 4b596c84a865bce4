import { Router, type NextFunction, type Request, type Response } from 'express';
import multer from 'multer';
import type { DataSource } from 'typeorm';
import { ROLES } from '../../shared/roles';
import { reviewBody } from '../../shared/schemas/review-body';
import { suiteListQuery } from '../../shared/schemas/suite-list-query';
import { uploadFileName } from '../../shared/schemas/upload-file-name';
import { suiteSlugParams, suiteVersionParams } from '../../shared/schemas/suite-slug-params';
import { suiteSchema } from '../../shared/schemas/suite-schema';
import { HttpError } from '../http/http-error';
import { InputError } from '../http/input-error';
import { declareRoute } from '../http/declare-route';
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
  const noSuite = { 404: 'No suite with that id.' };
  const saved = {
    201: 'A new suite, or a new draft version (`version`).',
    200: 'The draft saved in place (`version`).',
    403: "The latest version is another person's draft (an admin may take it over).",
    409: 'The suite exists already (create), or its latest version is waiting for review.',
  };

  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'The suites with their latest version, filtered',
      access: ROLES,
      query: suiteListQuery,
      responses: { 200: 'The suites (`suites`).' },
    },
    async (_req, res, { query }) => {
      res.json({ suites: await suites.list(query) });
    },
  );

  declareRoute(
    router,
    'get',
    '/:slug',
    {
      summary: 'Every version of one suite, newest first',
      access: ROLES,
      params: suiteSlugParams,
      responses: { 200: 'The versions (`versions`).', ...noSuite },
    },
    async (_req, res, { params: { slug } }) => {
      res.json({ versions: await suites.versions(slug) });
    },
  );

  declareRoute(
    router,
    'post',
    '/',
    {
      summary: 'Create a suite (version 1, a draft); checked in full: schema, subject whitelist, cut layout',
      access: ROLES,
      body: suiteSchema,
      checkBody: (value) => validateSuiteInput(value, 'body', 'the suite'),
      responses: { 201: saved[201], 409: saved[409] },
    },
    async (req, res, { body }) => {
      const { view } = await suites.save(req.user!, body, 'create');
      res.status(201).json({ version: view });
    },
  );

  declareRoute(
    router,
    'put',
    '/:slug',
    {
      summary: 'Save an edit of a suite: the draft in place, or a new draft version after a reviewed one',
      access: ROLES,
      params: suiteSlugParams,
      body: suiteSchema,
      checkBody: (value, req) => validateSuiteInput(value, 'body', String(req.params.slug)),
      responses: { ...saved, ...noSuite },
    },
    async (req, res, { params: { slug }, body }) => {
      if (body.id !== slug)
        throw new InputError([{ field: 'body.id', rule: `must stay "${slug}": a suite keeps its id across versions` }]);
      const { created, view } = await suites.save(req.user!, body, 'edit');
      res.status(created ? 201 : 200).json({ version: view });
    },
  );

  declareRoute(
    router,
    'post',
    '/upload',
    {
      summary: 'Upload a suite file: creates the suite or saves a new draft of it, checked as the form is',
      access: ROLES,
      upload: {
        field: 'file',
        mediaType: 'application/json',
        description: `A .json suite file in the field "file", at most ${MAX_UPLOAD_BYTES / 1024} KB.`,
        receive: receiveFile,
      },
      responses: saved,
    },
    async (req, res) => {
      const file = req.file;
      if (!file)
        throw new InputError([{ field: 'file', rule: 'is required (a .json suite file in the field "file")' }]);
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
    },
  );

  /**
   * A CSV of reference values computed elsewhere, checked against our reference for the suite's
   * latest version on a reference-table thread within its time budget (422 over it); the upload
   * is recorded only once the check has answered.
   */
  declareRoute(
    router,
    'post',
    '/:slug/reference-table',
    {
      summary: "Check a CSV of reference values computed elsewhere against ours for the suite's latest version",
      access: ROLES,
      params: suiteSlugParams,
      upload: {
        field: 'file',
        mediaType: 'text/csv',
        description: `A .csv table in the field "file", at most ${MAX_TABLE_BYTES / 1024} KB.`,
        receive: receiveTable,
      },
      responses: {
        200: 'What the check found (`check`), row by row.',
        ...noSuite,
        422: 'Checking the table passed its time budget (`over-time-budget`); the message says how to ask for less.',
        503: 'The reference-table threads are busy or stopped: try again.',
      },
    },
    async (req, res, { params: { slug } }) => {
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
    },
  );

  declareRoute(
    router,
    'post',
    '/:slug/submit',
    {
      summary: "Submit a suite's draft for review",
      access: ROLES,
      params: suiteSlugParams,
      responses: {
        200: 'The submitted version (`version`).',
        403: 'Only the author (or an admin) can submit this draft.',
        ...noSuite,
        409: 'The latest version is not a draft, or as stored it breaks the suite format’s rules (a path that would check nothing).',
      },
    },
    async (req, res, { params: { slug } }) => {
      res.json({ version: await suites.submit(req.user!, slug) });
    },
  );

  declareRoute(
    router,
    'post',
    '/:slug/versions/:version/review',
    {
      summary: 'Approve a submitted version or ask for changes (never one you wrote)',
      access: ['reviewer', 'admin'],
      params: suiteVersionParams,
      body: reviewBody,
      responses: {
        200: 'The reviewed version (`version`).',
        403: 'You wrote this version.',
        404: 'No such suite or version.',
        409: 'The version is not submitted, or, to approve it, as stored it breaks the suite format’s rules (a path that would check nothing).',
      },
    },
    async (req, res, { params: { slug, version }, body: { decision, comment } }) => {
      res.json({ version: await suites.review(req.user!, slug, version, decision, comment) });
    },
  );

  declareRoute(
    router,
    'post',
    '/:slug/versions/:version/retire',
    {
      summary: 'Retire an approved version',
      access: ['reviewer', 'maintainer', 'admin'],
      params: suiteVersionParams,
      responses: {
        200: 'The retired version (`version`).',
        404: 'No such suite or version.',
        409: 'The version is not approved.',
      },
    },
    async (_req, res, { params: { slug, version } }) => {
      res.json({ version: await suites.retire(slug, version) });
    },
  );

  return router;
}
