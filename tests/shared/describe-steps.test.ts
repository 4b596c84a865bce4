import { describeSteps } from '../../shared/describe-steps';

describe('describeSteps', () => {
  it('writes each step with the reference beside a step that left it, and marks the first to leave', () => {
    const text = describeSteps({
      steps: [
        { text: 'pow(z, 13)', library: { re: '-1', im: '-1.96e-15' }, reference: { re: '-1', im: '0' }, left: true },
        { text: 'log(pow(z, 13))', library: { re: '0', im: '-3.14' }, reference: { re: '0', im: '3.14' }, left: true },
      ],
      firstLeftStep: 0,
    });
    expect(text).toBe(
      'steps: 1. pow(z, 13) = −1 − 1.96e-15i (reference −1 + 0i), the first step to leave the reference; ' +
        '2. log(pow(z, 13)) = 0 − 3.14i (reference 0 + 3.14i)',
    );
  });

  it('writes ASCII signs on request and nothing for a finding without steps', () => {
    const step = { text: 'z - 1', library: { re: '-0', im: '0' }, reference: { re: '-0', im: '0' }, left: false };
    expect(describeSteps({ steps: [step] }, { ascii: true })).toBe('steps: 1. z - 1 = -0 + 0i');
    expect(describeSteps({})).toBe('');
  });
});
