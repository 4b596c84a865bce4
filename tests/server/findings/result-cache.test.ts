import { ResultCache } from '../../../server/findings/result-cache';

describe('ResultCache', () => {
  it('runs one computation for two requests of the same key made at once', async () => {
    const cache = new ResultCache<number>(4);
    let runs = 0;
    // The computation finishes only when the test says so: both requests are made while it is pending.
    let finish: (value: number) => void = () => undefined;
    const compute = () => {
      runs += 1;
      return new Promise<number>((resolve) => (finish = resolve));
    };
    const both = Promise.all([cache.get('k', compute), cache.get('k', compute)]);
    finish(42);
    const [a, b] = await both;
    expect([a, b, runs]).toEqual([42, 42, 1]);
  });

  it('forgets a failed computation so the next request tries again', async () => {
    const cache = new ResultCache<number>(4);
    await expect(cache.get('k', () => Promise.reject(new Error('boom')))).rejects.toThrow('boom');
    await Promise.resolve();
    expect(cache.has('k')).toBe(false);
    await expect(cache.get('k', async () => 7)).resolves.toBe(7);
  });

  it('drops the least recently used answer beyond its capacity', async () => {
    const cache = new ResultCache<string>(2);
    await cache.get('a', async () => 'a');
    await cache.get('b', async () => 'b');
    await cache.get('a', async () => 'never');
    await cache.get('c', async () => 'c');
    expect([cache.has('a'), cache.has('b'), cache.has('c'), cache.size]).toEqual([true, false, true, 2]);
  });
});
