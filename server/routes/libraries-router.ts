import { Router } from 'express';
import { ROLES } from '../../shared/roles';
import { cutMapQuery } from '../../shared/schemas/cut-map-query';
import { fingerprintQuery } from '../../shared/schemas/fingerprint-query';
import { targetNameParams } from '../../shared/schemas/target-name-params';
import { versionMatrixQuery } from '../../shared/schemas/version-matrix-query';
import { requireRole } from '../middleware/require-role';
import type { LibraryFindings } from '../findings/library-findings';
import { parseInput } from '../http/parse-input';

/**
 * What the harness finds out about installed libraries, mounted beside the targets list under
 * /api/targets: `:name` is a target ("complex.js@2.4.3", percent-encoded when it has a slash) for
 * the fingerprint and cut maps, and a library without its version ("complex.js") for the
 * version matrix. Every signed-in role may read them.
 */
export function librariesRouter(findings: LibraryFindings): Router {
  const router = Router();
  const anyone = requireRole(...ROLES);

  router.get('/:name/fingerprint', anyone, async (req, res) => {
    const { name } = parseInput(targetNameParams, req.params, 'params');
    const { fn, entry } = parseInput(fingerprintQuery, req.query, 'query');
    res.json(await findings.fingerprint(name, fn, entry));
  });

  router.get('/:name/cut-map', anyone, async (req, res) => {
    const { name } = parseInput(targetNameParams, req.params, 'params');
    res.json(await findings.cutMap(name, parseInput(cutMapQuery, req.query, 'query')));
  });

  router.get('/:name/version-matrix', anyone, async (req, res) => {
    const { name } = parseInput(targetNameParams, req.params, 'params');
    const { suite, entry } = parseInput(versionMatrixQuery, req.query, 'query');
    res.json(await findings.versionMatrix(name, suite, entry));
  });

  return router;
}
