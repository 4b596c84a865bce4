import type { RequestHandler } from 'express';
import type { z } from 'zod';
import type { RouteDeclaration } from './route-declaration';

/**
 * The declaration behind each handler that `declareRoute` registered, keyed by the handler
 * itself: the OpenAPI document walks the app's own router stack and reads them from here, so
 * the document's paths are the mounted paths and a route registered another way is missing from
 * it (which `tests/server/http/openapi-document.test.ts` reports).
 */
export const ROUTE_DECLARATIONS = new WeakMap<
  RequestHandler,
  RouteDeclaration<z.ZodType | undefined, z.ZodType | undefined, z.ZodType | undefined>
>();
