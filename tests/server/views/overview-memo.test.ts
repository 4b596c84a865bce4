import { EventEmitter } from 'node:events';
import type { Request, Response } from 'express';
import { OverviewMemo } from '../../../server/views/overview-memo';

describe('OverviewMemo', () => {
  it('computes a shared part once for callers within a second', async () => {
    const memo = new OverviewMemo();
    let computed = 0;
    const compute = async () => (computed += 1);
    const answers = await Promise.all([1, 2, 3].map(() => memo.shared('runs', compute)));
    expect(answers).toEqual([1, 1, 1]);
    expect(computed).toBe(1);
  });

  it('forgets everything once a request that may change something has answered, and keeps it for a GET', async () => {
    const memo = new OverviewMemo();
    let computed = 0;
    const compute = async () => (computed += 1);
    const finish = (method: string) => {
      const res = new EventEmitter();
      memo.forgetOnWrite({ method } as Request, res as unknown as Response, () => undefined);
      res.emit('finish');
    };
    await memo.shared('runs', compute);
    finish('GET');
    expect(await memo.shared('runs', compute)).toBe(1);
    finish('POST');
    expect(await memo.shared('runs', compute)).toBe(2);
  });

  it('forgets a computation that failed, so the next caller tries again', async () => {
    const memo = new OverviewMemo();
    await expect(memo.shared('runs', () => Promise.reject(new Error('database gone')))).rejects.toThrow(
      'database gone',
    );
    expect(await memo.shared('runs', async () => 'again')).toBe('again');
  });
});
