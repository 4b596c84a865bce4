import type { Application } from 'express';
import { z } from 'zod';
import { apiErrorSchema } from '../../shared/api-error-schema';
import { ROLES } from '../../shared/roles';
import { listDeclaredRoutes } from './list-declared-routes';

type JsonSchema = Record<string, unknown>;
type Declared = ReturnType<typeof listDeclaredRoutes>[number];
type Declaration = Declared['declaration'];

/** Methods whose requests the same-origin guard checks and the JSON body parser reads. */
const WRITING_METHODS = new Set(['post', 'put', 'patch', 'delete']);

/**
 * A zod schema as JSON Schema 2020-12, which OpenAPI 3.1 takes as it is: what a client sends
 * (`io: 'input'`: defaults make a field optional). `$defs` (only a recursive schema has them)
 * move to `components.schemas` under `name`, so every `$ref` resolves from the document's root.
 */
function jsonSchema(schema: z.ZodType, name: string, components: Record<string, JsonSchema>): JsonSchema {
  const { $schema: _dialect, $defs, ...rest } = z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' });
  const rename = (key: string) => `${name}.${key}`;
  // The definitions refer to each other (and to themselves) as well, so both are rewritten.
  let text = JSON.stringify({ rest, defs: $defs ?? {} });
  for (const key of Object.keys($defs ?? {}))
    text = text.split(`"#/$defs/${key}"`).join(`"#/components/schemas/${rename(key)}"`);
  const rewritten = JSON.parse(text) as { rest: JsonSchema; defs: Record<string, JsonSchema> };
  for (const [key, def] of Object.entries(rewritten.defs)) components[rename(key)] = def;
  return rewritten.rest;
}

/** Who may call a route, in words, for its description. */
function accessWords(d: Declaration): string {
  if (d.access === 'public') return 'Public: no sign-in needed.';
  const roles = d.access.length === ROLES.length ? 'any signed-in role' : `the role ${d.access.join(' or ')}`;
  const how = d.sessionOnly
    ? 'signed in with the session cookie only (an API token is refused)'
    : 'signed in with the session cookie or an API token';
  return `Needs ${roles}, ${how}.`;
}

/** The error answers every route of its kind can give, besides the ones it declares itself. */
function standardErrors(method: string, d: Declaration): Record<number, string> {
  const errors: Record<number, string> = {};
  const writes = WRITING_METHODS.has(method);
  if (d.params || d.query || d.body || d.upload || writes)
    errors[400] =
      'The input breaks a rule: `issues` names each field (`params.id`, `query.limit`, `body.name`) and its rule.';
  errors[401] =
    d.access === 'public'
      ? 'An API token was sent and is unknown or revoked.'
      : 'Not signed in (no session cookie, no API token), or the API token is unknown or revoked.';
  const forbidden: string[] = [];
  if (d.access !== 'public' && d.access.length < ROLES.length)
    forbidden.push(`the signed-in role is not ${d.access.join(' or ')}`);
  if (d.sessionOnly) forbidden.push('the request is signed in with an API token, not the session cookie');
  if (writes)
    forbidden.push("the request came from a page of another origin (its Origin or Referer is not one of the server's)");
  if (forbidden.length > 0) errors[403] = `Forbidden when ${forbidden.join('; or when ')}.`;
  if (writes) {
    errors[413] = 'The body is too large.';
    errors[415] = 'The body is in an encoding or of a type the route does not take.';
  }
  errors[503] =
    'The database cannot be reached right now (the answer says when to try again in `Retry-After`); nothing was read or saved.';
  errors[500] = 'Something went wrong on the server; the log has the details.';
  return errors;
}

function operation(route: Declared, components: Record<string, JsonSchema>): JsonSchema {
  const { method, path, declaration: d } = route;
  const id = `${method}${path.replace(/[{}]/g, '').replace(/[/.-]+(\w)/g, (_m, c: string) => c.toUpperCase())}`;
  const parameters: JsonSchema[] = [];
  const pathSchema = d.params ? jsonSchema(d.params, `${id}.params`, components) : {};
  const pathProperties = (pathSchema.properties ?? {}) as Record<string, JsonSchema>;
  for (const [, name] of path.matchAll(/\{(\w+)\}/g))
    parameters.push({ name, in: 'path', required: true, schema: pathProperties[name!] ?? { type: 'string' } });
  if (d.query) {
    const querySchema = jsonSchema(d.query, `${id}.query`, components);
    const required = new Set((querySchema.required ?? []) as string[]);
    for (const [name, schema] of Object.entries((querySchema.properties ?? {}) as Record<string, JsonSchema>))
      parameters.push({ name, in: 'query', required: required.has(name), schema });
  }
  const responses: Record<string, JsonSchema> = {};
  const own = Object.entries(d.responses).map(
    ([status, r]) => [Number(status), typeof r === 'string' ? { description: r } : r] as const,
  );
  for (const [status, r] of own) {
    if (status >= 400) continue;
    const content = r.schema
      ? { [r.mediaType ?? 'application/json']: { schema: jsonSchema(r.schema, `${id}.${status}`, components) } }
      : status === 204
        ? undefined
        : { [r.mediaType ?? 'application/json']: {} };
    responses[status] = { description: r.description, ...(content ? { content } : {}) };
  }
  const errors: Record<number, string> = standardErrors(method, d);
  for (const [status, r] of own)
    if (status >= 400) errors[status] = errors[status] ? `${r.description} ${errors[status]}` : r.description;
  for (const [status, description] of Object.entries(errors).sort(([a], [b]) => Number(a) - Number(b)))
    responses[status] = {
      description,
      content: { 'application/json': { schema: { $ref: '#/components/schemas/ApiError' } } },
    };
  const requestBody = d.upload
    ? {
        required: true,
        description: d.upload.description,
        content: {
          'multipart/form-data': {
            schema: {
              type: 'object',
              properties: { [d.upload.field]: { type: 'string', contentMediaType: d.upload.mediaType } },
              required: [d.upload.field],
            },
          },
        },
      }
    : d.body
      ? { required: true, content: { 'application/json': { schema: jsonSchema(d.body, `${id}.body`, components) } } }
      : undefined;
  return {
    operationId: id,
    summary: d.summary,
    description: accessWords(d),
    tags: [path.split('/')[2] ?? 'api'],
    ...(d.access === 'public'
      ? {}
      : { security: d.sessionOnly ? [{ sessionCookie: [] }] : [{ sessionCookie: [] }, { apiToken: [] }] }),
    'x-sheetkeeper-roles': d.access === 'public' ? [] : [...d.access],
    ...(parameters.length > 0 ? { parameters } : {}),
    ...(requestBody ? { requestBody } : {}),
    responses,
  };
}

/**
 * The OpenAPI 3.1 document of the app's API: every route registered with `declareRoute`, at the
 * path it is mounted at, with its roles, its parameters and body as the JSON Schema of the zod
 * schemas it validates with, and its answers (errors with the ApiError body).
 */
export function buildOpenApiDocument(app: Application, sessionCookie: string): JsonSchema {
  const components: Record<string, JsonSchema> = { ApiError: jsonSchema(apiErrorSchema, 'ApiError', {}) };
  const paths: Record<string, Record<string, JsonSchema>> = {};
  for (const route of listDeclaredRoutes(app)) (paths[route.path] ??= {})[route.method] = operation(route, components);
  return {
    openapi: '3.1.1',
    info: {
      title: 'Sheetkeeper API',
      version: '1',
      description: [
        'Checks of complex-math libraries: suites, plans, runs, failures and findings.',
        `Sign in with POST /api/auth/sign-in (e-mail and password): the answer sets the session cookie \`${sessionCookie}\` (7 days; POST /api/auth/sign-out ends it).`,
        'A program signs in with an API token instead: create one from a signed-in session with POST /api/tokens (its secret is shown once) and send `Authorization: Bearer skt_…` with each request; it acts as its owner for that request only.',
        "A POST, PUT, PATCH or DELETE from a browser page must come from one of the server's own origins. Every error answer has the ApiError body.",
      ].join('\n\n'),
    },
    paths,
    components: {
      schemas: components,
      securitySchemes: {
        sessionCookie: {
          type: 'apiKey',
          in: 'cookie',
          name: sessionCookie,
          description: 'Set by POST /api/auth/sign-in; httpOnly, SameSite=Lax.',
        },
        apiToken: {
          type: 'http',
          scheme: 'bearer',
          bearerFormat: 'skt_…',
          description: 'A token from POST /api/tokens; unknown or revoked is 401. Tokens cannot manage tokens.',
        },
      },
    },
  };
}
