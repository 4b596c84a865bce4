import { signInAs } from '../../setup/sign-in-as';
import { startTestApp, type TestApp } from '../../setup/test-app';

describe('subscriptions', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.stop());

  it('offers the installed libraries without versions and keeps my choice', async () => {
    const hanne = await signInAs(t.app, 'reviewer');
    const before = (await hanne.get('/api/subscriptions')).body;
    expect(before.targetKeys).toEqual([]);
    expect(before.available).toEqual(
      expect.arrayContaining(['complex.js', 'mathjs/complex', 'mathjs/number/predictable']),
    );
    expect(before.available.some((k: string) => k.includes('@'))).toBe(false);
    const saved = await hanne.put('/api/subscriptions').send({ targetKeys: ['mathjs/complex', 'complex.js'] });
    expect(saved.body.targetKeys).toEqual(['complex.js', 'mathjs/complex']);
    const bad = await hanne.put('/api/subscriptions').send({ targetKeys: ['complex.js@2.4.1'] });
    expect(bad.body.issues).toEqual([
      { field: 'body.targetKeys.0', rule: 'must be a library name such as complex.js or mathjs/number' },
    ]);
  });
});
