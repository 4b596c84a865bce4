import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import type { Role } from '../../shared/roles';

/**
 * What one API route takes and answers, given to `declareRoute`, which validates with these very
 * schemas and guards with these roles; the OpenAPI document (`/api/openapi.json`) is built from
 * the same object, so the two cannot drift apart.
 */
export interface RouteDeclaration<
  P extends z.ZodType | undefined = undefined,
  Q extends z.ZodType | undefined = undefined,
  B extends z.ZodType | undefined = undefined,
> {
  /** One line for the document: what the route does. */
  summary: string;
  /** Who may call it: `'public'` (no sign-in), or the roles of a signed-in user (session cookie or API token). */
  access: 'public' | readonly Role[];
  /** Only with the session cookie: an API token gets 403 (tokens cannot manage tokens). */
  sessionOnly?: true;
  /** The path parameters (`/:id`), parsed into `input.params`; a failure is 400 naming `params.<field>`. */
  params?: P;
  /** The query string, parsed into `input.query`; a failure is 400 naming `query.<field>`. */
  query?: Q;
  /** The JSON body, parsed into `input.body`; a failure is 400 naming `body.<field>`. */
  body?: B;
  /**
   * A fuller check of the body that starts from `body` (the suite check: the schema, then the
   * subject whitelist and the cut layout); it replaces the plain parse and throws an InputError.
   */
  checkBody?: (value: unknown, req: Request) => B extends z.ZodType ? z.output<B> : never;
  /** A multipart upload of one file, read by `receive` (after the role check, before the parameters). */
  upload?: { field: string; mediaType: string; description: string; receive: RequestHandler };
  /**
   * The answers this route gives itself, by status: a description, or a description with the
   * JSON schema of the body (where shared/ has one) or another media type. Status 400 for bad
   * input, 401/403 for the roles, 413/415 for bodies, 503 and 500 are added to the document
   * from the rest of the declaration; a 4xx or 5xx here has the ApiError body.
   */
  responses: Record<number, string | { description: string; schema?: z.ZodType; mediaType?: string }>;
}
