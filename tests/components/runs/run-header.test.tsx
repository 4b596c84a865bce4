import { render, screen } from '@testing-library/react';
import { RunHeader } from '../../../components/runs/run-header';
import { RUNNING_RUN } from '../../setup/running-run';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const COMPLETED = { ...RUNNING_RUN, status: 'completed' as const, shardsDone: 4, finishedAt: '2026-03-01T02:41:00Z' };

describe('RunHeader', () => {
  it('says a plan’s first completed run compared with nothing, instead of "0 since the previous completed run"', () => {
    render(<RunHeader run={{ ...COMPLETED, regressions: null }} canCancel={false} />);
    expect(screen.getByText('first run of this plan to complete: nothing to compare with')).toBeTruthy();
    expect(screen.queryByText(/0 since/)).toBeNull();
  });

  it('links the regressions to the failure table filtered to them, in the words of every other screen', () => {
    render(<RunHeader run={{ ...COMPLETED, regressions: 31 }} canCancel={false} />);
    const link = screen.getByRole('link', {
      name: '↑ 31 regressions since the previous completed run: open them in the failure table',
    });
    expect(link.getAttribute('href')).toBe(`/failures?run=${RUNNING_RUN.id}&status=new`);
  });

  it('judges the run by its stored count of stopped checks before its matrix is known, as the runs list does', () => {
    render(<RunHeader run={{ ...COMPLETED, checksStopped: 2 }} canCancel={false} />);
    expect(screen.getByText('◊ completed with errors')).toBeTruthy();
    expect(screen.getByText('2 checks stopped by an error')).toBeTruthy();
    expect(screen.queryByTestId('run-check-tally')).toBeNull();
  });

  it('says a cancelled run is not compared', () => {
    render(<RunHeader run={{ ...COMPLETED, status: 'cancelled', regressions: null }} canCancel={false} />);
    expect(screen.getByText('not compared: the run was cancelled before every pair was checked')).toBeTruthy();
  });
});
