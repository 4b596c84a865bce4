import { render, screen } from '@testing-library/react';
import { RunCard } from '../../../components/runs/run-card';
import { RUNNING_RUN } from '../../setup/running-run';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

describe('RunCard', () => {
  it('says on the card of a live run that some pairs wait for a worker that has their target', () => {
    render(<RunCard run={{ ...RUNNING_RUN, status: 'queued', waitingFor: ['complex.js@2.5.0', 'numpy@2.2.4'] }} />);
    expect(screen.getByTestId(`run-${RUNNING_RUN.id}-waiting`).textContent).toBe(
      'Waiting for a worker that has complex.js@2.5.0 or numpy@2.2.4; none is running. These checks start once such a worker starts (npm run worker on a machine that has them).',
    );
  });

  it('says nothing of workers while every pair has one', () => {
    render(<RunCard run={RUNNING_RUN} />);
    expect(screen.queryByTestId(`run-${RUNNING_RUN.id}-waiting`)).toBeNull();
  });
});
