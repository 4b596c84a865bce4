import { failureQuery } from '../../../shared/schemas/failure-query';

const issues = (q: Record<string, string>) => {
  const r = failureQuery.safeParse(q);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};

describe('failureQuery', () => {
  it('takes a class of finding, branch or accuracy, and names the field for anything else', () => {
    expect(failureQuery.parse({ class: 'branch' })).toMatchObject({ class: 'branch' });
    expect(failureQuery.parse({ class: 'accuracy' })).toMatchObject({ class: 'accuracy' });
    expect(issues({ class: 'sheet' })).toEqual(['class: must be one of branch, accuracy']);
    expect(issues({ class: 'branch\u0000' })).toEqual(['class: must be one of branch, accuracy']);
  });

  it('takes the cursors the server writes, <id>:<rank> and <id>:<rank>:<ulps>, and refuses others', () => {
    for (const after of ['30:0', '30:2', '9223372036854775807:1', '12:1:4.5e+18'])
      expect(failureQuery.parse({ after }).after).toBe(after);
    for (const after of ['30', '30:3', '30:-1', '99999999999999999999:0', '12:1:1e999', '12:1:abc', '12:1:NaN'])
      expect(issues({ after })).toEqual(['after: must be a cursor from a previous page']);
  });
});
