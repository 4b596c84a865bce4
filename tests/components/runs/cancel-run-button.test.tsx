import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { CancelRunButton } from '../../../components/runs/cancel-run-button';
import { runKey } from '../../../client/use-run';
import type { RunView } from '../../../shared/run-view';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

const RUN: RunView = {
  id: '7d3f9a52-1c4e-4b8a-9f10-2a6c5e8d4b31',
  planId: null,
  planName: 'complex.js nightly',
  trigger: 'manual',
  status: 'running',
  shardsTotal: 8,
  shardsDone: 3,
  counts: { pass: 300, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
  byClass: { branch: 0, accuracy: 0 },
  checksStopped: 0,
  checksFailed: 0,
  regressions: null,
  waitingFor: [],
  requestedBy: 'Kwame Asante',
  createdAt: '2026-03-01T02:30:00Z',
  startedAt: '2026-03-01T02:30:01Z',
  finishedAt: null,
};
const click = (name: string) => act(() => fireEvent.click(screen.getByRole('button', { name })));

describe('CancelRunButton', () => {
  it('asks first, saying what cancelling does, and sends nothing until confirmed', async () => {
    const calls = mockFetch(200, { run: { ...RUN, status: 'cancelled' } });
    renderWithClient(<CancelRunButton runId={RUN.id} />);
    await click('Cancel run…');
    expect(screen.getByText('Cancel this run?')).toBeTruthy();
    expect(screen.getByText(/a shard in progress stops at its next path/)).toBeTruthy();
    expect(calls).toHaveLength(0);
    await click('Keep it running');
    expect(screen.queryByText('Cancel this run?')).toBeNull();
    expect(calls).toHaveLength(0);
  });

  it('cancels on confirmation and shows the run cancelled at once', async () => {
    const calls = mockFetch(200, { run: { ...RUN, status: 'cancelled' } });
    const { client } = renderWithClient(<CancelRunButton runId={RUN.id} />);
    client.setQueryData(runKey(RUN.id), RUN);
    await click('Cancel run…');
    await click('Yes, cancel the run');
    expect(calls[0]).toMatchObject({ url: `/api/runs/${RUN.id}/cancel`, init: { method: 'POST' } });
    await waitFor(() => expect(client.getQueryData<RunView>(runKey(RUN.id))?.status).toBe('cancelled'));
  });

  it("shows the server's refusal and puts the run back as it was", async () => {
    mockFetch(409, { kind: 'conflict', message: 'The run is completed already.' });
    const { client } = renderWithClient(<CancelRunButton runId={RUN.id} />);
    client.setQueryData(runKey(RUN.id), RUN);
    await click('Cancel run…');
    await click('Yes, cancel the run');
    await waitFor(() => expect(screen.getByText('× The run is completed already.')).toBeTruthy());
    expect(client.getQueryData<RunView>(runKey(RUN.id))?.status).toBe('running');
  });
});
