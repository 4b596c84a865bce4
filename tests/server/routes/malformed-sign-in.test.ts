import fc from 'fast-check';
import request from 'supertest';
import { startTestApp, type TestApp } from '../../setup/test-app';

const SEED = 20261201;

/** A raw request: a body as bytes and the content type it claims. */
interface RawRequest {
  contentType: string;
  body: string;
}

const notAnEmail = fc.oneof(
  fc.string(),
  fc.constantFrom('', ' ', '@', 'a@', '@b.io', 'a b@c.io', 'x'.repeat(300) + '@b.io'),
);
const anyJson = fc.jsonValue({ maxDepth: 3 });

/** Bodies that are wrong in every way we could think of; none of them is a valid sign-in. */
const malformed: fc.Arbitrary<RawRequest> = fc.oneof(
  // Not JSON at all, claimed as JSON.
  fc
    .string({ minLength: 1 })
    .filter((s) => !isJson(s))
    .map((body) => ({ contentType: 'application/json', body })),
  // JSON, but not an object.
  fc
    .oneof(fc.integer(), fc.string(), fc.boolean(), fc.constant(null), fc.array(anyJson, { maxLength: 4 }))
    .map((v) => ({ contentType: 'application/json', body: JSON.stringify(v) })),
  // Objects with the wrong types or missing fields.
  fc
    .record({ email: anyJson, password: anyJson }, { requiredKeys: [] })
    .filter((o) => !(typeof o.email === 'string' && typeof o.password === 'string'))
    .map((o) => ({ contentType: 'application/json', body: JSON.stringify(o) })),
  // Strings that are not e-mail addresses.
  fc
    .record({ email: notAnEmail, password: fc.string({ minLength: 1, maxLength: 20 }) })
    .map((o) => ({ contentType: 'application/json', body: JSON.stringify(o) })),
  // Unknown extra fields.
  fc
    .record({
      email: fc.constant('ravi@sheetkeeper.test'),
      password: fc.constant('x'),
      role: fc.constantFrom('admin', 1, null),
    })
    .map((o) => ({ contentType: 'application/json', body: JSON.stringify(o) })),
  // Passwords past the limit, and an empty one.
  fc.constantFrom('', 'x'.repeat(201), 'é'.repeat(250)).map((password) => ({
    contentType: 'application/json',
    body: JSON.stringify({ email: 'ravi@sheetkeeper.test', password }),
  })),
  // The right fields sent as a form or as text.
  fc
    .constantFrom('application/x-www-form-urlencoded', 'text/plain', 'multipart/form-data; boundary=x')
    .map((contentType) => ({ contentType, body: 'email=ravi%40sheetkeeper.test&password=x' })),
  // Over the body size limit.
  fc.constant({
    contentType: 'application/json',
    body: JSON.stringify({ email: 'ravi@sheetkeeper.test', password: 'p'.repeat(300_000) }),
  }),
);

function isJson(s: string): boolean {
  try {
    JSON.parse(s);
    return true;
  } catch {
    return false;
  }
}

describe('malformed sign-in bodies', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.stop());

  it(`answers 200 generated malformed bodies with 4xx and never 5xx (seed ${SEED})`, async () => {
    const samples = fc.sample(malformed, { numRuns: 200, seed: SEED });
    expect(samples).toHaveLength(200);
    const answers: { status: number; sample: RawRequest }[] = [];
    for (const sample of samples) {
      const res = await request(t.app)
        .post('/api/auth/sign-in')
        .set('Content-Type', sample.contentType)
        .send(sample.body);
      answers.push({ status: res.status, sample });
    }
    const outside = answers.filter((a) => a.status < 400 || a.status >= 500);
    expect({ seed: SEED, outside }).toEqual({ seed: SEED, outside: [] });
    // Nearly all are 400 with field-level issues; a few are 413 (too large) or 401 (well-formed but unknown).
    const byStatus = answers.reduce<Record<number, number>>(
      (acc, a) => ({ ...acc, [a.status]: (acc[a.status] ?? 0) + 1 }),
      {},
    );
    expect(byStatus[400]).toBeGreaterThan(150);
  });

  it('names the field and the rule in a 400', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: 'not-an-address', password: '' });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({
      kind: 'invalid-input',
      issues: [
        { field: 'body.email', rule: 'must be an e-mail address' },
        { field: 'body.password', rule: 'is required' },
      ],
    });
  });
});
