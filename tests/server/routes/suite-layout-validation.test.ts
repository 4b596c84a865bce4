import type request from 'supertest';
import { demoSuiteBody } from '../../setup/demo-suite-body';
import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('suite validation on save and upload', () => {
  let t: TestApp;
  let ravi: request.Agent;

  beforeAll(async () => {
    t = await startTestApp();
    ravi = await signInAs(t.app, 'contributor');
  });
  afterAll(() => t.stop());

  const finiteCut = (id: string) => {
    const body = demoSuiteBody(id, 'sqrt-z2-minus-1-finite-cut') as Record<string, unknown> & {
      branch: Record<string, unknown>;
    };
    // (z(z−1))^{1/3} with the one finite cut [0, 1]: the loop around it has monodromy e^{2πi·2/3}.
    body.branch = {
      ...body.branch,
      g: 'z*(z - 1)',
      nu: '1/3',
      cuts: [
        {
          points: [
            { re: '0', im: '0' },
            { re: '1', im: '0' },
          ],
          to_infinity: false,
        },
      ],
    };
    return body;
  };

  it('names the failing loop and the schema rules of the same body in one answer', async () => {
    const res = await ravi.post('/api/suites').send({ ...finiteCut('layout-and-title'), title: 'ab' });
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      { field: 'body.title', rule: 'must be at least 3 characters' },
      {
        field: 'body.branch.cuts',
        rule: expect.stringMatching(
          /^a loop around the cut through \(0, 0\), \(1, 0\) crosses no cut, yet going once around it multiplies the value by e\^\{2πi·2\/3\}, not 1/,
        ),
      },
    ]);
    expect((await ravi.get('/api/suites/layout-and-title')).status).toBe(404);
  });

  it('refuses the same layout in an uploaded file under file.branch.cuts', async () => {
    const res = await ravi
      .post('/api/suites/upload')
      .attach('file', Buffer.from(JSON.stringify(finiteCut('layout-upload'))), 'layout-upload.json');
    expect(res.status).toBe(400);
    expect(res.body.issues).toEqual([
      {
        field: 'file.branch.cuts',
        rule: expect.stringMatching(/going once around it multiplies the value by e\^\{2πi·2\/3\}/),
      },
    ]);
  });

  it('accepts the layout once the cut continues to infinity', async () => {
    const body = finiteCut('layout-fixed');
    (body.branch.cuts as { to_infinity: boolean }[])[0]!.to_infinity = true;
    const res = await ravi.post('/api/suites').send(body);
    expect(res.status).toBe(201);
  });
});
