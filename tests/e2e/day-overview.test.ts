import { DEMO_USERS } from '../../server/seed/demo-users';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import type { OverviewView } from '../../shared/overview-view';
import type { RunView } from '../../shared/run-view';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { pageApi } from './support/page-api';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();

const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;
const PLAN = 'complex.js nightly';

/** The API as the signed-in page sees it (same origin, session cookie). */
const api = <T>(path: string, method = 'GET', body?: unknown) =>
  pageApi(b.page)<{ status: number; body: T }>(path, method, body);

describe("A maintainer on a plan's mail list, the morning after regressions (issue 15, points 1, 2 and 8)", () => {
  it('sees the regressions waiting for him and on the plan card past a cancelled run, follows them newest first, and reads the same words everywhere', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    // His situation: the nightly plan's mail list names him (the demo seed), and he subscribes to no library.
    expect((await api('/subscriptions', 'PUT', { targetKeys: [] })).status).toBe(200);
    const before = (await api<{ overview: OverviewView }>('/overview')).body.overview;
    const nightly = before.plans.find((p) => p.planName === PLAN)!;
    const completed = nightly.completed!;
    const n = completed.regressions!;
    expect(n).toBeGreaterThan(0);

    // A newer run of the plan, cancelled at once: it must not hide the completed run's regressions.
    const started = await api<{ run: { id: string } }>('/runs', 'POST', { planId: nightly.planId });
    expect(started.status).toBe(202);
    expect((await api(`/runs/${started.body.run.id}/cancel`, 'POST')).status).toBe(200);

    await b.page.goto(`${BASE_URL}/`);
    const panel = b.page.getByTestId('needs-me');
    const waiting = panel.getByRole('link', {
      name: new RegExp(`^${COMPARISON_WORDS.regressions(n)} in complex\\.js nightly: `),
    });
    await waiting.waitFor();
    expect(await waiting.getAttribute('href')).toBe(`/failures?run=${completed.id}&status=new`);
    expect(await panel.getByText('Nothing is waiting for you').count()).toBe(0);
    await panel.getByText("You receive this plan's regression mail", { exact: false }).waitFor();

    const card = b.page.getByTestId(`plan-${PLAN}`);
    await card
      .getByTestId(`plan-${PLAN}-newer`)
      .getByText(/^A newer run was cancelled .* not compared/)
      .waitFor();
    const cardLink = card.getByTestId(`plan-${PLAN}-regressions`);
    expect((await cardLink.textContent())?.startsWith(`${COMPARISON_WORDS.regressions(n)} since`)).toBe(true);
    expect(await card.getByText(/fewer failed/).count()).toBe(0);
    await saveScreenshots(b.page, 'day-overview-overview', () => cardLink.waitFor());

    // The card's regressions open the failure table filtered to them, newest first.
    await cardLink.click();
    await b.page.waitForURL(/\/failures\?/);
    const url = new URL(b.page.url());
    expect([url.searchParams.get('run'), url.searchParams.get('status')]).toEqual([completed.id, 'new']);
    const newest = b.page.getByRole('radio', { name: 'Branch findings first, then: newest first' });
    expect(await newest.getAttribute('aria-checked')).toBe('true');
    await b.page.getByText(new RegExp(COMPARISON_WORDS.regressionMark)).first().waitFor();
    await saveScreenshots(b.page, 'day-overview-regressions', () =>
      b.page.getByText(new RegExp(COMPARISON_WORDS.regressionMark)).first().waitFor(),
    );

    // The run page links the same count in the same words.
    await b.page.goto(`${BASE_URL}/runs/${completed.id}`);
    const runLink = b.page.getByRole('link', {
      name: `${COMPARISON_WORDS.regressions(n)} ${COMPARISON_WORDS.since}: open them in the failure table`,
    });
    await runLink.waitFor();
    await saveScreenshots(b.page, 'day-overview-run', () => runLink.waitFor());

    // The plan's first completed run says so, instead of "0 since the previous completed run".
    const done = await api<{ runs: RunView[] }>(`/runs?plan=${nightly.planId}&status=completed&limit=50`);
    const first = done.body.runs[done.body.runs.length - 1]!;
    expect(first.regressions).toBeNull();
    await b.page.goto(`${BASE_URL}/runs/${first.id}`);
    await b.page.getByText(COMPARISON_WORDS.firstRun).waitFor();

    // The runs list: the same words, the cancelled run among them.
    await goTo(b.page, 'Runs');
    await b.page
      .getByTestId(`run-${completed.id}`)
      .getByText(COMPARISON_WORDS.regressions(n), { exact: false })
      .waitFor();
    await b.page.getByTestId(`run-${started.body.run.id}`).waitFor();
  });
});
