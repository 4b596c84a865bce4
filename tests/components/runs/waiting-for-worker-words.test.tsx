import { waitingForWorkerWords } from '../../../components/runs/waiting-for-worker-words';

describe('waitingForWorkerWords', () => {
  it('names the one target no running worker has', () => {
    expect(waitingForWorkerWords(['complex.js@2.5.0'])).toBe(
      'Waiting for a worker that has complex.js@2.5.0; none is running. These checks start once such a worker starts (npm run worker on a machine that has it).',
    );
  });

  it('names several targets as alternatives, the last after "or"', () => {
    expect(waitingForWorkerWords(['a@1', 'b@2', 'c@3'])).toBe(
      'Waiting for a worker that has a@1, b@2 or c@3; none is running. These checks start once such a worker starts (npm run worker on a machine that has them).',
    );
  });
});
