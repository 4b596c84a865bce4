import { DEMO_USERS } from '../../server/seed/demo-users';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { pageApi } from './support/page-api';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();

const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;

/** The API as the signed-in page sees it (same origin, session cookie). */
const api = <T>(path: string, method = 'GET', body?: unknown): Promise<T> => pageApi(b.page)<T>(path, method, body);

describe('Overview and runs', () => {
  it('shows the Overview, the Runs list and a finished run with its matrix and what it checked', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    const nightly = b.page.getByTestId('plan-complex.js nightly');
    await nightly.waitFor();
    await nightly
      .getByText(/regression|No earlier completed run/)
      .first()
      .waitFor();
    await b.page.getByText('Latest run of each plan').waitFor();
    await b.page.getByTestId('needs-me').waitFor();
    await b.page.getByText('A green result in Sheetkeeper is evidence').waitFor();
    await saveScreenshots(b.page, 'overview', () => nightly.waitFor());

    await goTo(b.page, 'Runs');
    const firstRun = b.page.locator('[data-testid^="run-"]').first();
    await firstRun.waitFor();
    await saveScreenshots(b.page, 'runs-list', () => firstRun.waitFor());

    // On a phone the filters fold behind one button.
    await b.page.getByRole('button', { name: 'Filter runs' }).click();
    await b.page.getByRole('radiogroup', { name: 'Status filter' }).waitFor();

    // Filter to completed runs of the nightly plan: the address carries the filters.
    await b.page.getByRole('radio', { name: 'Plan: complex.js nightly' }).click();
    await b.page.getByRole('radio', { name: 'Status: completed' }).click();
    await b.page.waitForURL(/status=completed/);
    expect(new URL(b.page.url()).searchParams.get('status')).toBe('completed');
    const completed = b.page.locator('[data-testid^="run-"]').first();
    await completed.getByText('complex.js nightly').waitFor();
    await completed.click();

    await b.page.getByRole('heading', { name: 'Each suite against each library version' }).waitFor();
    const note = b.page.getByTestId('checked-scope-note');
    await note.getByText(/points in all/).waitFor();
    await note.getByText(/not a certificate/).waitFor();
    const cells = b.page.locator('[data-testid^="cell-"]');
    await cells.first().waitFor();
    // Every cell says its outcome with a glyph, and a cell with failures links to the filtered failure table.
    const texts = await cells.allTextContents();
    expect(texts.length).toBeGreaterThan(0);
    for (const text of texts) expect(text).toMatch(/[✓❌◊×…↻]/);
    // ✓ is drawn by our check-mark font, not IBM Plex (whose ✓ looks like √): the face for U+2713 has loaded.
    await b.page.waitForFunction(() => {
      let loaded = false;
      document.fonts.forEach((f) => {
        if (f.family.replace(/"/g, '') === 'SheetkeeperMarks' && f.unicodeRange === 'U+2713' && f.status === 'loaded')
          loaded = true;
      });
      return loaded;
    });
    const failing = b.page.locator('a[data-testid^="cell-"][href^="/failures"]').first();
    if ((await failing.count()) > 0)
      expect(await failing.getAttribute('href')).toMatch(/^\/failures\?run=[0-9a-f-]{36}&suite=[^&]+&target=[^&]+$/);
    await b.page.getByText('Property checks', { exact: true }).waitFor();
    // One picture of the whole screen (saveScreenshots grows the window to show all of it): shots
    // scrolled to the matrix and to the property checks were the same 1440×5900 picture twice more.
    await saveScreenshots(b.page, 'run-detail', () =>
      b.page.getByRole('heading', { name: 'Each suite against each library version' }).waitFor(),
    );
  });

  it('follows a run started through the API live, and cancels it after a confirm step', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    // A plan big enough to be caught running: every approved suite against every installed
    // complex.js release (~300 shards). The demo nightly's shards (two per suite) end within seconds.
    const suites = await api<{ body: { suites: { slug: string }[] } }>('/suites?status=approved');
    const targets = await api<{ body: { targets: { name: string; library: string; installed: boolean }[] } }>(
      '/targets',
    );
    const made = await api<{ status: number; body: { plan: { id: string } } }>('/plans', 'POST', {
      name: 'complex.js every release',
      description: 'Every approved suite against every installed complex.js release, run on demand.',
      recipients: [kwame.email],
      suites: suites.body.suites.map((s) => s.slug),
      targets: targets.body.targets.filter((t) => t.installed && t.library === 'complex.js').map((t) => t.name),
    });
    expect(made.status).toBe(201);
    const started = await api<{ status: number; body: { run: { id: string; shardsTotal: number } } }>('/runs', 'POST', {
      planId: made.body.plan.id,
    });
    expect(started.status).toBe(202);
    const run = started.body.run;
    expect(run.shardsTotal).toBeGreaterThan(200);

    // The Overview lists it in progress with its bar.
    await b.page.goto(`${BASE_URL}/`);
    await b.page
      .getByTestId(`run-${run.id}`)
      .getByRole('progressbar', { name: /^Progress:/ })
      .waitFor();
    await saveScreenshots(b.page, 'overview-run-in-progress', () => b.page.getByTestId(`run-${run.id}`).waitFor());

    await b.page.getByTestId(`run-${run.id}`).click();
    const bar = b.page.getByRole('progressbar', { name: /^Progress:/ });
    await bar.waitFor();
    expect(await bar.getAttribute('aria-valuetext')).toMatch(new RegExp(`^\\d+ of ${run.shardsTotal} checks$`));
    // The bar moves by itself: some shard finishes without reloading the page.
    await b.page.getByText(new RegExp(`^[1-9]\\d* of ${run.shardsTotal} checks`)).waitFor({ timeout: 30_000 });
    await saveScreenshots(b.page, 'run-detail-in-progress', () => bar.waitFor());

    await b.page.getByRole('button', { name: 'Cancel run…' }).click();
    await b.page.getByText('Cancel this run?').waitFor();
    await b.page.getByRole('button', { name: 'Keep it running' }).click();
    expect((await api<{ body: { run: { status: string } } }>(`/runs/${run.id}`)).body.run.status).toMatch(
      /queued|running/,
    );
    await b.page.getByRole('button', { name: 'Cancel run…' }).click();
    // The screen shows "cancelled" at once (optimistic); the server's answer comes after it.
    const answered = b.page.waitForResponse(
      (r) => r.url().endsWith(`/api/runs/${run.id}/cancel`) && r.request().method() === 'POST',
    );
    await b.page.getByRole('button', { name: 'Yes, cancel the run' }).click();
    await b.page.getByText('× cancelled').first().waitFor();
    expect((await answered).status()).toBe(200);
    expect((await api<{ body: { run: { status: string } } }>(`/runs/${run.id}`)).body.run.status).toBe('cancelled');
    expect(await b.page.getByRole('progressbar', { name: /^Progress:/ }).count()).toBe(0);
  });
});
