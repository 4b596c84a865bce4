import { narrowTargets } from '../../../server/targets/narrow-targets';

const HERE = [
  'cmath@3.11.2',
  'complex.js@2.3.0',
  'complex.js@2.4.1',
  'complex.js@2.4.3',
  'mathjs@15.2.0/complex',
  'mathjs@15.2.0/complex/predictable',
  'mathjs@15.2.0/number',
];

describe('narrowTargets', () => {
  it('takes every target this machine has when nothing narrows them', () => {
    expect(narrowTargets(HERE, null)).toEqual(HERE);
  });

  it('keeps the targets a pattern names whole or begins, in their own order', () => {
    expect(narrowTargets(HERE, ['complex.js@2.4', 'cmath@3.11.2'])).toEqual([
      'cmath@3.11.2',
      'complex.js@2.4.1',
      'complex.js@2.4.3',
    ]);
    expect(narrowTargets(HERE, ['mathjs@15.2.0/complex'])).toEqual([
      'mathjs@15.2.0/complex',
      'mathjs@15.2.0/complex/predictable',
    ]);
  });

  it('announces nothing the machine lacks, whatever the patterns name', () => {
    expect(narrowTargets(HERE, ['complex.js@2.5.0', 'numpy'])).toEqual([]);
  });

  it('names a target once, however many patterns match it', () => {
    expect(narrowTargets([...HERE, 'cmath@3.11.2'], ['cmath', 'cmath@3'])).toEqual(['cmath@3.11.2']);
  });
});
