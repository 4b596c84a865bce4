import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { useState } from 'react';
import type { RunFilters } from '../../../client/use-runs';
import { RunsList } from '../../../components/runs/runs-list';
import type { RunView } from '../../../shared/run-view';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { setScreenWidth } from '../../setup/set-screen-width';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const NIGHTLY = '11111111-1111-4111-8111-111111111111';
const RELEASE = '22222222-2222-4222-8222-222222222222';
const PLANS = [
  { id: NIGHTLY, name: 'complex.js nightly' },
  { id: RELEASE, name: 'mathjs before release' },
];

const run = (n: number, over: Partial<RunView> = {}): RunView => ({
  id: `aaaaaaaa-0000-4000-8000-${String(n).padStart(12, '0')}`,
  planId: NIGHTLY,
  planName: 'complex.js nightly',
  trigger: 'schedule',
  status: 'completed',
  shardsTotal: 4,
  shardsDone: 4,
  counts: { pass: 480, fail: 3, error: 0, skipped: 0, notApplicable: 0 },
  byClass: { branch: 3, accuracy: 0 },
  checksStopped: 0,
  checksFailed: 0,
  regressions: 2,
  waitingFor: [],
  requestedBy: null,
  createdAt: '2026-03-01T02:30:00Z',
  startedAt: '2026-03-01T02:30:00Z',
  finishedAt: '2026-03-01T02:33:05Z',
  ...over,
});

/** RunsList with its filters held as the route holds them (in the address). */
function Harness({ initial = {} }: { initial?: RunFilters }) {
  const [filters, setFilters] = useState<RunFilters>(initial);
  return <RunsList filters={filters} onFiltersChange={setFilters} />;
}

/** The API: plans, and runs answered by the filters in the request. */
function api(runs: RunView[], pageSize = 25) {
  return mockFetchRoutes((url) => {
    if (url.startsWith('/api/plans')) return { body: { plans: PLANS } };
    const q = new URL(url, 'http://x').searchParams;
    let rows = runs.filter(
      (r) =>
        (!q.get('plan') || r.planId === q.get('plan')) &&
        (!q.get('status') || r.status === q.get('status')) &&
        (!q.get('trigger') || r.trigger === q.get('trigger')),
    );
    const before = q.get('before');
    if (before) rows = rows.slice(rows.findIndex((r) => r.id === before) + 1);
    const page = rows.slice(0, pageSize);
    return { body: { runs: page, next: rows.length > pageSize ? page[page.length - 1]!.id : null } };
  });
}

const runCalls = (calls: { url: string }[]) => calls.filter((c) => c.url.startsWith('/api/runs')).map((c) => c.url);

describe('RunsList', () => {
  beforeEach(() => setScreenWidth(390));

  it('shows each run with its plan, trigger, who, when, duration, counts and status in words', async () => {
    api([
      run(1),
      run(2, {
        trigger: 'manual',
        requestedBy: 'Kwame Asante',
        status: 'running',
        shardsDone: 1,
        finishedAt: null,
        regressions: null,
        counts: { pass: 120, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
        startedAt: new Date(Date.now() - 42_000).toISOString(),
      }),
    ]);
    renderWithClient(<Harness />);
    const first = await screen.findByTestId(`run-${run(1).id}`);
    expect(within(first).getByText('complex.js nightly')).toBeTruthy();
    expect(within(first).getByText('❌ completed with failures')).toBeTruthy();
    expect(within(first).getByText(/^scheduled · .* · 3 min 5 s$/)).toBeTruthy();
    expect(within(first).getByText('❌ 3 branch findings')).toBeTruthy();
    expect(within(first).getByText('↑ 2 regressions since the previous completed run')).toBeTruthy();
    const live = screen.getByTestId(`run-${run(2).id}`);
    expect(within(live).getByText('↻ running')).toBeTruthy();
    expect(within(live).getByText(/^by Kwame Asante · .* · running 4\d s$/)).toBeTruthy();
    expect(within(live).getByText('1 of 4 checks · 25%')).toBeTruthy();
    expect(first.getAttribute('href')).toBe(`/runs/${run(1).id}`);
  });

  it.each([390, 1440])(
    'at %i px, says a run whose points all passed but two checks stopped by an error completed with errors, and how many',
    async (width) => {
      setScreenWidth(width);
      const stopped = run(3, {
        counts: { pass: 480, fail: 0, error: 0, skipped: 308, notApplicable: 0 },
        byClass: { branch: 0, accuracy: 0 },
        checksStopped: 2,
        checksFailed: 0,
        regressions: null,
      });
      api([stopped, run(4, { counts: stopped.counts, byClass: stopped.byClass, regressions: null })]);
      renderWithClient(<Harness />);
      const row = await screen.findByTestId(`run-${stopped.id}`);
      expect(within(row).getByText('◊ completed with errors')).toBeTruthy();
      expect(within(row).getByText('2 checks stopped by an error')).toBeTruthy();
      expect(within(row).queryByText(/all checked points passed/)).toBeNull();
      // The same points with every check judged is the green run.
      const clean = screen.getByTestId(`run-${run(4).id}`);
      expect(within(clean).getByText('✓ all checked points passed')).toBeTruthy();
      expect(within(clean).queryByText(/stopped by an error/)).toBeNull();
      if (width >= 1024)
        expect(row.getAttribute('aria-label')).toMatch(
          /^Run of complex.js nightly, completed with errors, 2 checks stopped by an error, /,
        );
    },
  );

  it('asks the API again with each filter chosen, and marks the chosen chip with a filled ring', async () => {
    const calls = api([
      run(1),
      run(2, { planId: RELEASE, planName: 'mathjs before release', trigger: 'manual', status: 'cancelled' }),
    ]);
    renderWithClient(<Harness />);
    await screen.findByTestId(`run-${run(1).id}`);
    // On a phone the filters fold behind one button that says which are on.
    expect(screen.queryByRole('radio', { name: 'Plan: mathjs before release' })).toBeNull();
    expect(screen.getByText('all runs')).toBeTruthy();
    await act(() => fireEvent.click(screen.getByRole('button', { name: /^Filter runs/ })));
    expect(screen.getByRole('button', { name: /^Filter runs/ }).getAttribute('aria-expanded')).toBe('true');
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Plan: mathjs before release' })));
    await waitFor(() => expect(screen.queryByTestId(`run-${run(1).id}`)).toBeNull());
    expect(screen.getByTestId(`run-${run(2).id}`)).toBeTruthy();
    expect(screen.getByRole('radio', { name: 'Plan: mathjs before release' }).getAttribute('aria-checked')).toBe(
      'true',
    );
    const marked = screen.getAllByRole('radio').filter((r) => within(r).queryByTestId('chosen-mark'));
    expect(marked.map((r) => r.getAttribute('aria-label'))).toContain('Plan: mathjs before release');
    expect(marked.map((r) => r.getAttribute('aria-label'))).not.toContain('Plan: complex.js nightly');
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Status: × cancelled' })));
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Trigger: by hand' })));
    await screen.findByTestId(`run-${run(2).id}`);
    expect(runCalls(calls).at(-1)).toBe(`/api/runs?limit=25&plan=${RELEASE}&status=cancelled&trigger=manual`);
    expect(screen.getByText('mathjs before release · × cancelled · by hand')).toBeTruthy();
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Plan: any plan' })));
    await waitFor(() => expect(runCalls(calls).at(-1)).toBe('/api/runs?limit=25&status=cancelled&trigger=manual'));
  });

  it('says when no run matches the filters', async () => {
    api([run(1)]);
    renderWithClient(<Harness initial={{ status: 'failed' }} />);
    expect(await screen.findByText('No run matches these filters.')).toBeTruthy();
  });

  it('loads older runs on demand, keyed by the last run shown', async () => {
    const runs = Array.from({ length: 30 }, (_, i) => run(i + 1));
    const calls = api(runs);
    renderWithClient(<Harness />);
    expect(await screen.findByText('25 runs shown, more below')).toBeTruthy();
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Show older runs' })));
    expect(await screen.findByText('30 runs shown')).toBeTruthy();
    expect(runCalls(calls).at(-1)).toBe(`/api/runs?limit=25&before=${runs[24]!.id}`);
    expect(screen.queryByRole('button', { name: 'Show older runs' })).toBeNull();
  });

  it('shows a table with column headings on a wide screen', async () => {
    setScreenWidth(1440);
    api([run(1)]);
    renderWithClient(<Harness />);
    await screen.findByTestId(`run-${run(1).id}`);
    expect(screen.getAllByRole('columnheader').map((h) => h.textContent)).toEqual([
      'Status',
      'Plan',
      'Started',
      'Duration',
      'Points',
    ]);
  });

  it('shows the error and a retry when the runs cannot be loaded', async () => {
    mockFetchRoutes((url) =>
      url.startsWith('/api/plans')
        ? { body: { plans: PLANS } }
        : { status: 500, body: { kind: 'server-error', message: 'The database is not answering.' } },
    );
    renderWithClient(<Harness />);
    expect(await screen.findByText('× The database is not answering.')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });
});
