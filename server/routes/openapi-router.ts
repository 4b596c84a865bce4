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
  // Kept as its JSON text: the document is ~140 KB, and writing it out took ~14 ms a request.
  const built = new WeakMap<Application, string>();
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
      // Built on the first request, once every router is mounted: ~125 ms measured while the test
      // suite loaded the machine (load average ~12), then never again in this process.
      const text = built.get(req.app) ?? JSON.stringify(buildOpenApiDocument(req.app, sessionCookie));
      built.set(req.app, text);
      res.set('Cache-Control', `public, max-age=${DOCUMENT_MAX_AGE_SECONDS}`).type('json').send(text);
    },
  );
  return router;
}
