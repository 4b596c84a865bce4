import type { Application, RequestHandler } from 'express';
import type { z } from 'zod';
import type { RouteDeclaration } from './route-declaration';
import { ROUTE_DECLARATIONS } from './route-declarations';
import { openApiPath } from './openapi-path';

/** The parts of router 2's layers this reads (Express 5: `app.router.stack`). */
interface StackLayer {
  rawPath?: string | RegExp | (string | RegExp)[];
  route?: { path: string; stack: { method?: string; handle: RequestHandler }[] };
  handle?: { stack?: StackLayer[] };
}

interface DeclaredRoute {
  method: string;
  /** The OpenAPI form of the mounted path: `/api/plans/{id}`. */
  path: string;
  declaration: RouteDeclaration<z.ZodType | undefined, z.ZodType | undefined, z.ZodType | undefined>;
}

/**
 * Every route of the app registered with `declareRoute`, in registration order, with the path it
 * is mounted at: read from the app's router stack, so a prefix in create-app.ts is never written twice.
 */
export function listDeclaredRoutes(app: Application): DeclaredRoute[] {
  const found: DeclaredRoute[] = [];
  const walk = (stack: StackLayer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const step of layer.route.stack) {
          const declaration = ROUTE_DECLARATIONS.get(step.handle);
          if (declaration && step.method)
            found.push({ method: step.method, path: openApiPath(prefix, layer.route.path), declaration });
        }
      } else if (layer.handle?.stack && typeof layer.rawPath === 'string') {
        walk(layer.handle.stack, openApiPath(prefix, layer.rawPath));
      }
    }
  };
  walk((app.router as unknown as { stack: StackLayer[] }).stack, '');
  return found;
}
