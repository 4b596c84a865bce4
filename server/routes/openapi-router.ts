import { Router, type Application } from 'express';
import { buildOpenApiDocument } from '../http/build-openapi-document';
import { declareRoute } from '../http/declare-route';

/**
 * How long a client may keep the document: it changes only with a new server build, and a
 * minute keeps a generator or an API browser that polls it from rebuilding it on every call.
 */
const DOCUMENT_MAX_AGE_SECONDS = 60;

/** Mounted at `/api/openapi.json`: the API's OpenAPI 3.1 document, built once from the app's declared routes on first request. */
export function openApiRouter(sessionCookie: string): Router {
  const router = Router();
  const built = new WeakMap<Application, Record<string, unknown>>();
  declareRoute(
    router,
    'get',
    '/',
    {
      summary: 'This description of the API, as an OpenAPI 3.1 document',
      access: 'public',
      responses: { 200: 'The OpenAPI 3.1 document (JSON Schema 2020-12 for every body and parameter).' },
    },
    (req, res) => {
      const document = built.get(req.app) ?? buildOpenApiDocument(req.app, sessionCookie);
      built.set(req.app, document);
      res.set('Cache-Control', `public, max-age=${DOCUMENT_MAX_AGE_SECONDS}`).json(document);
    },
  );
  return router;
}
