import { randomUUID } from 'node:crypto';
import request from 'supertest';
import { apiErrorSchema } from '../../../shared/api-error-schema';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

type Json = Record<string, unknown>;
interface ListedRoute {
  path: unknown;
  methods?: string[];
  router?: { listRoutes(): ListedRoute[] };
}

/** Every method and path the Express app itself registered under /api, read through router 2's `listRoutes`. */
function registeredApiRoutes(routes: ListedRoute[], prefix: string): string[] {
  return routes.flatMap((r) => {
    if (typeof r.path !== 'string') throw new Error(`a route path that is not a string: ${String(r.path)}`);
    const path = `${prefix}/${r.path}`.replace(/\/+/g, '/').replace(/(.)\/$/, '$1');
    if (r.router) return registeredApiRoutes(r.router.listRoutes(), path);
    // HEAD is Express's own answer to every GET; '*' would be `.all()`, which no API route uses.
    return (r.methods ?? []).filter((m) => m !== 'HEAD').map((m) => `${m} ${path.replace(/:(\w+)/g, '{$1}')}`);
  });
}

function operations(doc: Json): [string, Json][] {
  return Object.entries(doc.paths as Record<string, Record<string, Json>>).flatMap(([path, item]) =>
    Object.entries(item).map(([method, op]): [string, Json] => [`${method.toUpperCase()} ${path}`, op]),
  );
}

/** Every `$ref` in the document, with the JSON pointer it names. */
function refs(value: unknown): string[] {
  if (Array.isArray(value)) return value.flatMap(refs);
  if (!value || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => (k === '$ref' && typeof v === 'string' ? [v] : refs(v)));
}

function resolve(doc: Json, ref: string): unknown {
  if (!ref.startsWith('#/')) return undefined;
  return ref
    .slice(2)
    .split('/')
    .map((p) => p.replace(/~1/g, '/').replace(/~0/g, '~'))
    .reduce<unknown>((at, key) => (at && typeof at === 'object' ? (at as Json)[key] : undefined), doc);
}

/**
 * Where `value` leaves its documented JSON schema: an object's fields must be the documented
 * properties (every required one, no other), an array's items are checked alike, a string is a string.
 */
function departures(schema: Json, value: unknown, at: string): string[] {
  if (schema.type === 'array')
    return Array.isArray(value)
      ? value.flatMap((v, i) => departures(schema.items as Json, v, `${at}.${i}`))
      : [`${at} is not an array`];
  if (schema.type === 'object') {
    if (!value || typeof value !== 'object') return [`${at} is not an object`];
    const properties = (schema.properties ?? {}) as Record<string, Json>;
    const required = (schema.required ?? []) as string[];
    return [
      ...required.filter((k) => !(k in value)).map((k) => `${at}.${k} is missing`),
      ...Object.keys(value)
        .filter((k) => !(k in properties))
        .map((k) => `${at}.${k} is not documented`),
      ...Object.entries(value).flatMap(([k, v]) => (properties[k] ? departures(properties[k], v, `${at}.${k}`) : [])),
    ];
  }
  if (schema.type === 'string' && typeof value !== 'string') return [`${at} is not a string`];
  return [];
}

/** A path parameter value its documented schema accepts. */
function sampleParam(schema: Json): string {
  if (schema.format === 'uuid') return randomUUID();
  if (schema.type === 'integer') return '1';
  const pattern = typeof schema.pattern === 'string' ? new RegExp(schema.pattern) : /./;
  return ['a', '1'].find((v) => pattern.test(v)) ?? 'a';
}

describe('GET /api/openapi.json', () => {
  let t: TestApp;
  let doc: Json;
  beforeAll(async () => {
    t = await startTestApp();
    doc = (await request(t.app).get('/api/openapi.json')).body;
  });
  afterAll(() => t.stop());

  it('is public, cached briefly and carries the same security headers as the rest of the API', async () => {
    const res = await request(t.app).get('/api/openapi.json');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^application\/json/);
    expect(res.headers['cache-control']).toBe('public, max-age=60');
    const other = await request(t.app).get('/api/me');
    for (const header of ['content-security-policy', 'x-content-type-options', 'strict-transport-security'])
      expect(res.headers[header]).toBe(other.headers[header]);
  });

  it('lists every route the app registers under /api, with the same method and path, and no other', () => {
    const registered = registeredApiRoutes(
      (t.app as unknown as { router: { listRoutes(): ListedRoute[] } }).router.listRoutes(),
      '',
    ).filter((r) => r.split(' ')[1]!.startsWith('/api'));
    const documented = operations(doc).map(([key]) => key);
    expect(new Set(documented).size).toBe(documented.length);
    expect([...documented].sort()).toEqual([...registered].sort());
    expect(documented).toContain('GET /api/openapi.json');
    expect(documented).toContain('POST /api/suites/{slug}/versions/{version}/review');
  });

  it('has the shape of an OpenAPI 3.1 document, and every $ref resolves', () => {
    expect(doc.openapi).toMatch(/^3\.1\.\d+$/);
    expect(doc.info).toEqual(expect.objectContaining({ title: expect.any(String), version: expect.any(String) }));
    for (const [key, op] of operations(doc)) {
      expect({ key, summary: typeof op.summary }).toEqual({ key, summary: 'string' });
      const responses = Object.entries(op.responses as Record<string, Json>);
      expect({ key, ok: responses.some(([s]) => /^2\d\d$/.test(s)) }).toEqual({ key, ok: true });
      for (const [status, r] of responses)
        expect({ key, status, d: typeof r.description }).toEqual({ key, status, d: 'string' });
      const pathParams = [...key.matchAll(/\{(\w+)\}/g)].map((m) => m[1]);
      const declared = ((op.parameters ?? []) as Json[]).filter((p) => p.in === 'path').map((p) => p.name);
      expect({ key, params: declared }).toEqual({ key, params: pathParams });
    }
    const ids = operations(doc).map(([, op]) => op.operationId);
    expect(new Set(ids).size).toBe(ids.length);
    const all = refs(doc);
    expect(all.length).toBeGreaterThan(0);
    for (const ref of all) expect({ ref, resolves: resolve(doc, ref) !== undefined }).toEqual({ ref, resolves: true });
  });

  it('documents the roles, the sign-in ways and the error body of a guarded route', () => {
    const review = (doc.paths as Json)['/api/suites/{slug}/versions/{version}/review'] as Record<string, Json>;
    const op = review.post!;
    expect(op['x-sheetkeeper-roles']).toEqual(['reviewer', 'admin']);
    expect(op.security).toEqual([{ sessionCookie: [] }, { apiToken: [] }]);
    expect(Object.keys(op.responses as Json)).toEqual(
      expect.arrayContaining(['200', '400', '401', '403', '404', '409']),
    );
    const tokens = (doc.paths as Json)['/api/tokens'] as Record<string, Json>;
    expect(tokens.post!.security).toEqual([{ sessionCookie: [] }]);
    const signIn = (doc.paths as Json)['/api/auth/sign-in'] as Record<string, Json>;
    expect(signIn.post!.security).toBeUndefined();
    const schemes = (doc.components as Json).securitySchemes as Json;
    expect(schemes.sessionCookie).toMatchObject({ type: 'apiKey', in: 'cookie', name: 'sheetkeeper.sid' });
    expect(schemes.apiToken).toMatchObject({ type: 'http', scheme: 'bearer' });
  });

  it('answers with the body its document describes, where the route documents one', async () => {
    const admin = await signInAs(t.app, 'admin');
    await admin.post('/api/tokens').send({ name: 'described' });
    await admin.post('/api/users/invitations').send({ email: 'described@example.test', role: 'reviewer' });
    // A live worker (beat just now), so the worker list has an item to hold to its schema.
    await t.db.dataSource.query(`INSERT INTO workers (label, targets) VALUES ('described:1', '{complex.js@2.4.3}')`);
    const described = operations(doc).filter(
      ([key, op]) =>
        key.startsWith('GET ') &&
        !key.includes('{') &&
        ((op.responses as Record<string, Json>)['200']?.content as Json | undefined)?.['application/json'] &&
        (((op.responses as Record<string, Json>)['200']!.content as Json)['application/json'] as Json).schema,
    );
    expect(described.map(([key]) => key).sort()).toEqual([
      'GET /api/me',
      'GET /api/tokens',
      'GET /api/users',
      'GET /api/users/invitations',
      'GET /api/workers',
    ]);
    for (const [key, op] of described) {
      const schema = ((((op.responses as Json)['200'] as Json).content as Json)['application/json'] as Json).schema;
      const res = await admin.get(key.slice('GET '.length));
      expect({ key, status: res.status, departures: departures(schema as Json, res.body, 'body') }).toEqual({
        key,
        status: 200,
        departures: [],
      });
    }
  });

  it('refuses a value outside a documented query enum with 400 naming that parameter', async () => {
    const admin = await signInAs(t.app, 'admin');
    const checked: string[] = [];
    for (const [key, op] of operations(doc)) {
      if (!key.startsWith('GET ') || key.includes('{')) continue;
      for (const p of ((op.parameters ?? []) as Json[]).filter((q) => q.in === 'query' && (q.schema as Json).enum)) {
        const res = await admin.get(key.slice('GET '.length)).query({ [p.name as string]: 'not-a-listed-value' });
        const fields = ((res.body.issues ?? []) as { field: string }[]).map((i) => i.field);
        expect({ key, status: res.status, fields }).toEqual({
          key,
          status: 400,
          fields: [`query.${p.name as string}`],
        });
        checked.push(`${key}?${p.name as string}`);
      }
    }
    expect(checked.length).toBeGreaterThanOrEqual(5);
  });

  /**
   * The fields an empty body must name: the schema's `required`, or for a union (a discriminated
   * union documents `oneOf`) the fields every alternative requires, which is the discriminator that
   * zod names first.
   */
  const requiredOf = (schema: Json): string[] => {
    if (Array.isArray(schema.required)) return schema.required as string[];
    const alternatives = (schema.oneOf ?? schema.anyOf) as Json[] | undefined;
    if (!alternatives) return [];
    const each = alternatives.map(requiredOf);
    return (each[0] ?? []).filter((f) => each.every((r) => r.includes(f)));
  };

  it("names, for an empty body, exactly the required fields of each route's documented body schema", async () => {
    const admin = await signInAs(t.app, 'admin');
    const withBodies = operations(doc).filter(([, op]) => (op.requestBody as Json | undefined)?.content);
    const checked: string[] = [];
    for (const [key, op] of withBodies) {
      const content = (op.requestBody as Json).content as Json;
      if (!content['application/json']) continue;
      const schema = (content['application/json'] as Json).schema as Json;
      const [method, template] = key.split(' ') as [string, string];
      const path = template.replace(/\{(\w+)\}/g, (_m, name: string) => {
        const param = (op.parameters as Json[]).find((p) => p.name === name && p.in === 'path')!;
        return sampleParam(param.schema as Json);
      });
      const res = await admin[method.toLowerCase() as 'post' | 'put' | 'patch'](path).send({});
      expect({ key, status: res.status, kind: res.body.kind }).toEqual({ key, status: 400, kind: 'invalid-input' });
      expect({ key, errorBody: apiErrorSchema.safeParse(res.body).success }).toEqual({ key, errorBody: true });
      const fields = (res.body.issues as { field: string }[]).map((i) => i.field);
      expect({ key, paramsAccepted: fields.every((f) => !f.startsWith('params')) }).toEqual({
        key,
        paramsAccepted: true,
      });
      const named = fields.filter((f) => f.startsWith('body.')).map((f) => f.slice('body.'.length).split('.')[0]);
      expect({ key, fields: [...new Set(named)].sort() }).toEqual({
        key,
        fields: [...requiredOf(schema)].sort(),
      });
      checked.push(key);
    }
    // Sign-in, plans, schedules (three), runs, users, tokens, subscriptions, suites (two), review, classify.
    expect(checked.length).toBeGreaterThanOrEqual(13);
  });
});
