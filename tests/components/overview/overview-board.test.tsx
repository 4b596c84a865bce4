import { screen, waitFor, within } from '@testing-library/react';
import { OverviewBoard } from '../../../components/overview/overview-board';
import type { OverviewView } from '../../../shared/overview-view';
import type { PublicUser } from '../../../shared/public-user';
import type { Role } from '../../../shared/roles';
import type { RunView } from '../../../shared/run-view';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';
import { setScreenWidth } from '../../setup/set-screen-width';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const user = (role: Role): PublicUser => ({
  id: 'u1',
  email: `${role}@sheetkeeper.test`,
  displayName: 'Some One',
  role,
  createdAt: '2026-01-01T00:00:00Z',
  deactivatedAt: null,
});
const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000).toISOString();

const run = (over: Partial<RunView>): RunView => ({
  id: 'aaaaaaaa-0000-4000-8000-000000000001',
  planId: 'p1',
  planName: 'complex.js nightly',
  trigger: 'schedule',
  status: 'completed',
  shardsTotal: 4,
  shardsDone: 4,
  counts: { pass: 480, fail: 7, error: 0, skipped: 0, notApplicable: 0 },
  byClass: { branch: 2, accuracy: 5 },
  checksStopped: 0,
  checksFailed: 0,
  regressions: 5,
  waitingFor: [],
  requestedBy: null,
  createdAt: hoursAgo(3),
  startedAt: hoursAgo(3),
  finishedAt: hoursAgo(2.9),
  ...over,
});

const OVERVIEW: OverviewView = {
  plans: [
    {
      planId: 'p1',
      planName: 'complex.js nightly',
      completed: run({}),
      comparison: {
        previous: { id: 'r0', finishedAt: hoursAgo(27) },
        common: { pairs: 4, fail: 5, error: 0 },
        targetsAdded: { targets: [], fail: 0, error: 0 },
        targetsRemoved: { targets: [], fail: 0, error: 0 },
        suitesAdded: { slugs: [], fail: 0, error: 0 },
        suitesRemoved: { slugs: [], fail: 0, error: 0 },
      },
      newer: null,
    },
    { planId: 'p2', planName: 'mathjs before release', completed: null, comparison: null, newer: null },
  ],
  inProgress: [
    run({
      id: 'aaaaaaaa-0000-4000-8000-000000000002',
      status: 'running',
      shardsDone: 1,
      counts: { pass: 120, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
      regressions: null,
      finishedAt: null,
      trigger: 'manual',
      requestedBy: 'Kwame Asante',
      createdAt: hoursAgo(0.01),
      startedAt: hoursAgo(0.01),
    }),
  ],
  needsMe: {
    reviewQueue: [
      {
        slug: 'atanh-near-one',
        version: 2,
        title: 'atanh next to ±1',
        subject: 'atanh(z)',
        authorName: 'Mei Okonkwo',
        since: hoursAgo(5),
        reviewerName: null,
        reviewComment: null,
      },
    ],
    changesRequested: [],
    subscriptions: ['complex.js'],
    mailPlans: [],
    regressions: [
      {
        targetKey: 'complex.js',
        runId: 'aaaaaaaa-0000-4000-8000-000000000001',
        planName: 'complex.js nightly',
        finishedAt: hoursAgo(2.9),
        count: 5,
        branch: 2,
      },
    ],
  },
};

describe('OverviewBoard', () => {
  beforeEach(() => setScreenWidth(390));

  it('shows who is signed in and the note that green is evidence, not a certificate, while it loads', () => {
    global.fetch = jest.fn(() => new Promise<Response>(() => undefined)) as typeof fetch;
    renderWithClient(<OverviewBoard user={user('maintainer')} />);
    expect(screen.getByTestId('home-email').textContent).toBe('maintainer@sheetkeeper.test');
    expect(screen.getByText('Loading…')).toBeTruthy();
    expect(
      screen.getByText(/evidence for the points, paths and conventions that a suite checked — not a certificate/),
    ).toBeTruthy();
  });

  it('shows the latest run of each plan with its regressions and what changed since the run before, and a plan that never ran', async () => {
    mockFetch(200, { overview: OVERVIEW });
    renderWithClient(<OverviewBoard user={user('maintainer')} />);
    const nightly = await screen.findByTestId('plan-complex.js nightly');
    expect(within(nightly).getByText('❌ completed with failures')).toBeTruthy();
    // Branch findings first, apart from accuracy findings.
    const counts = within(nightly)
      .getAllByText(/findings$/)
      .map((e) => e.textContent);
    expect(counts).toEqual(['❌ 2 branch findings', '≈ 5 accuracy findings']);
    const regressions = within(nightly).getByRole('link', {
      name: '↑ 5 regressions since the previous completed run: open them in the failure table',
    });
    expect(regressions.getAttribute('href')).toBe('/failures?run=aaaaaaaa-0000-4000-8000-000000000001&status=new');
    expect(
      within(nightly).getByText(
        'On the 4 suite × target pairs both runs checked, since the previous completed run: ↑ 5 more failed.',
      ),
    ).toBeTruthy();
    expect(
      within(nightly)
        .getByRole('link', { name: 'Open run: the latest completed run of complex.js nightly' })
        .getAttribute('href'),
    ).toBe('/runs/aaaaaaaa-0000-4000-8000-000000000001');
    expect(
      within(nightly).getByRole('link', { name: 'All runs of this plan, complex.js nightly' }).getAttribute('href'),
    ).toBe('/runs?plan=p1');
    expect(
      within(screen.getByTestId('plan-mathjs before release')).getByText(
        '− Not run yet: nothing checked for this plan.',
      ),
    ).toBeTruthy();
  });

  it('shows a run in progress with its bar in words', async () => {
    mockFetch(200, { overview: OVERVIEW });
    renderWithClient(<OverviewBoard user={user('maintainer')} />);
    const live = await screen.findByTestId('run-aaaaaaaa-0000-4000-8000-000000000002');
    expect(within(live).getByText('1 of 4 checks · 25%')).toBeTruthy();
    expect(within(live).getByText('↻ running')).toBeTruthy();
    expect(screen.getByRole('heading', { name: /In progress/ }).textContent).toBe('↻ In progress (1)');
  });

  it('gives a reviewer the suites to review and the regressions on subscribed libraries, each a link', async () => {
    mockFetch(200, { overview: OVERVIEW });
    renderWithClient(<OverviewBoard user={user('reviewer')} />);
    const panel = await screen.findByTestId('needs-me');
    expect(within(panel).getByText('Waiting for you: 2')).toBeTruthy();
    expect(
      within(panel)
        .getByRole('link', { name: /^atanh next to ±1 · v2/ })
        .getAttribute('href'),
    ).toBe('/review/atanh-near-one');
    expect(within(panel).getByText('atanh next to ±1 · v2')).toBeTruthy();
    const regression = within(panel).getByRole('link', {
      name: /^↑ 5 regressions on complex\.js: 2 branch, 3 accuracy/,
    });
    expect(regression.getAttribute('href')).toBe('/failures?run=aaaaaaaa-0000-4000-8000-000000000001&status=new');
    expect(within(regression).getByText('↑ 5 regressions on complex.js: 2 branch, 3 accuracy')).toBeTruthy();
    expect(within(panel).queryByText(/Your suites sent back/)).toBeNull();
  });

  it("gives a contributor their suites sent back with the reviewer's comment, and no review queue", async () => {
    mockFetch(200, {
      overview: {
        ...OVERVIEW,
        needsMe: {
          reviewQueue: null,
          changesRequested: [
            {
              slug: 'log-branch',
              version: 1,
              title: 'log above the cut',
              subject: 'log(z)',
              authorName: 'Ravi Dutta',
              since: hoursAgo(1),
              reviewerName: 'Hanne Lindqvist',
              reviewComment: 'Add a straddle at 5e-324.',
            },
          ],
          subscriptions: [],
          mailPlans: [],
          regressions: [],
        },
      },
    });
    renderWithClient(<OverviewBoard user={user('contributor')} />);
    const panel = await screen.findByTestId('needs-me');
    expect(within(panel).queryByText(/Suites to review/)).toBeNull();
    const sentBack = within(panel).getByRole('link', { name: /changes requested by/ });
    expect(sentBack.getAttribute('href')).toBe('/suites/log-branch');
    expect(within(sentBack).getByText('“Add a straddle at 5e-324.”')).toBeTruthy();
    expect(
      within(panel).getByText('✓ No plan mails you its regressions and you subscribe to no library (Settings).'),
    ).toBeTruthy();
  });

  it('says so when nothing waits, and shows an error with a retry when the overview cannot be loaded', async () => {
    mockFetch(200, {
      overview: {
        plans: [],
        inProgress: [],
        needsMe: {
          reviewQueue: null,
          changesRequested: [],
          subscriptions: ['mathjs'],
          mailPlans: ['mathjs before release'],
          regressions: [],
        },
      },
    });
    const { unmount } = renderWithClient(<OverviewBoard user={user('maintainer')} />);
    expect(await screen.findByText('✓ Nothing is waiting for you')).toBeTruthy();
    expect(
      screen.getByText(
        '✓ No regressions in the latest completed runs of the plans that mail you (mathjs before release) or on your libraries (mathjs).',
      ),
    ).toBeTruthy();
    expect(screen.getByText('No plans yet. A maintainer makes one under Plans.')).toBeTruthy();
    unmount();
    mockFetch(500, { kind: 'server-error', message: 'The database is not answering.' });
    renderWithClient(<OverviewBoard user={user('maintainer')} />);
    await waitFor(() => expect(screen.getByText('× The database is not answering.')).toBeTruthy());
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
    expect(screen.getByTestId('home-email')).toBeTruthy();
  });
});
