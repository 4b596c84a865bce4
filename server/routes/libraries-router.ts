import { Router } from 'express';
import { ROLES } from '../../shared/roles';
import { cutMapQuery } from '../../shared/schemas/cut-map-query';
import { fingerprintQuery } from '../../shared/schemas/fingerprint-query';
import { targetNameParams } from '../../shared/schemas/target-name-params';
import { versionMatrixQuery } from '../../shared/schemas/version-matrix-query';
import type { LibraryFindings } from '../findings/library-findings';
import { declareRoute } from '../http/declare-route';

/**
 * What the harness finds out about installed libraries, mounted beside the targets list under
 * /api/targets: `:name` is a target ("complex.js@2.4.3", percent-encoded when it has a slash) for
 * the fingerprint and cut maps, and a library without its version ("complex.js") for the
 * version matrix. Every signed-in role may read them.
 */
export function librariesRouter(findings: LibraryFindings): Router {
  const router = Router();

  const errors = {
    404: 'No installed target (or library) with that name.',
    503: 'A library computation stopped after its time limit, or too many wait (`unavailable`): try again or ask for less.',
  };

  declareRoute(
    router,
    'get',
    '/:name/fingerprint',
    {
      summary: "A target's convention fingerprint: which side of each cut and which zero sign it takes",
      access: ROLES,
      params: targetNameParams,
      query: fingerprintQuery,
      responses: { 200: 'The fingerprint.', ...errors },
    },
    async (_req, res, { params: { name }, query: { fn, entry } }) => {
      res.json(await findings.fingerprint(name, fn, entry));
    },
  );

  declareRoute(
    router,
    'get',
    '/:name/cut-map',
    {
      summary: "Where a target's function jumps, sampled over a window of the plane",
      access: ROLES,
      params: targetNameParams,
      query: cutMapQuery,
      responses: { 200: 'The cut map.', ...errors },
    },
    async (_req, res, { params: { name }, query }) => {
      res.json(await findings.cutMap(name, query));
    },
  );

  declareRoute(
    router,
    'get',
    '/:name/version-matrix',
    {
      summary: 'One suite against every installed version of a library (`:name` without its version)',
      access: ROLES,
      params: targetNameParams,
      query: versionMatrixQuery,
      responses: {
        200: 'The version matrix.',
        ...errors,
        409: 'The library has one installed version; a matrix needs two or more.',
      },
    },
    async (_req, res, { params: { name }, query: { suite, entry } }) => {
      res.json(await findings.versionMatrix(name, suite, entry));
    },
  );

  return router;
}
