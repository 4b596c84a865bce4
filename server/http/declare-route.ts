import type { NextFunction, Request, RequestHandler, Response, Router } from 'express';
import type { z } from 'zod';
import { requireRole } from '../middleware/require-role';
import { requireSession } from '../middleware/require-session';
import { parseInput } from './parse-input';
import type { RouteDeclaration } from './route-declaration';
import { ROUTE_DECLARATIONS } from './route-declarations';

type Parsed<S> = S extends z.ZodType ? z.output<S> : undefined;

/** The request's parts as the route's schemas parsed them. */
interface RouteInput<P, Q, B> {
  params: Parsed<P>;
  query: Parsed<Q>;
  body: Parsed<B>;
}

/**
 * Registers one API route on `router` from its declaration: the role guard (and the session-only
 * guard), the upload, then params, query and body parsed with the declared schemas (400 naming
 * the first part that fails), then `handler` with the parsed input. The declaration is kept for
 * the OpenAPI document (`route-declarations.ts`), so what the route checks is what it documents.
 */
export function declareRoute<
  P extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  B extends z.ZodType | undefined = undefined,
>(
  router: Router,
  method: 'get' | 'post' | 'put' | 'patch' | 'delete',
  path: string,
  declaration: RouteDeclaration<P, Q, B>,
  handler: (req: Request, res: Response, input: RouteInput<P, Q, B>, next: NextFunction) => unknown,
): void {
  const guards: RequestHandler[] = [];
  if (declaration.access !== 'public') guards.push(requireRole(...declaration.access));
  if (declaration.sessionOnly) guards.push(requireSession);
  if (declaration.upload) guards.push(declaration.upload.receive);
  const { params, query, body, checkBody } = declaration;
  const handle: RequestHandler = (req, res, next) => {
    const input = {
      params: params ? parseInput(params, req.params, 'params') : undefined,
      query: query ? parseInput(query, req.query, 'query') : undefined,
      body: checkBody ? checkBody(req.body, req) : body ? parseInput(body, req.body, 'body') : undefined,
    } as RouteInput<P, Q, B>;
    return handler(req, res, input, next);
  };
  ROUTE_DECLARATIONS.set(
    handle,
    declaration as RouteDeclaration<z.ZodType | undefined, z.ZodType | undefined, z.ZodType | undefined>,
  );
  router[method](path, ...guards, handle);
}
