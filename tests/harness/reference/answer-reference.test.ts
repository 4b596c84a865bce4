import { answerReference } from '../../../harness/reference/answer-reference';

describe('answerReference', () => {
  it.each(['sin', 'toString', 'constructor', '__proto__', 'hasOwnProperty'])(
    'answers "unknown function" for %s, a name outside the catalogue, even one every object inherits',
    (fn) => {
      expect(answerReference({ fn, z: { re: '1', im: '0' }, convention: 'signed-zero' })).toEqual({
        error: `unknown function "${fn}"`,
      });
    },
  );

  it('evaluates a catalogue function named in the request', () => {
    expect(answerReference({ fn: 'sqrt', z: { re: '-4', im: '-0' }, convention: 'signed-zero', digits: 5 })).toEqual({
      value: { re: '0', im: '-2' },
      double: { re: '0', im: '-2' },
    });
  });
});
