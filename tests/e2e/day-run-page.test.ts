import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { shortRunId } from '../../shared/short-run-id';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { pageApi } from './support/page-api';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();
const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;

/** complex.js has no cbrt (harness/adapters/complex-js-target.ts asks the package), so that check stops on an error. */
const TARGET = 'complex.js@2.4.3';
const SUITES = ['sqrt-principal-sz', 'cbrt-principal-sz'];

/** How tall the screen is, scrolled in full: the app scrolls inside its own frame, not the document. */
const screenHeight = (page: Page): Promise<number> =>
  page.evaluate(() =>
    Math.max(
      document.documentElement.scrollHeight,
      ...Array.from(document.querySelectorAll('div'))
        .filter((el) => /auto|scroll/.test(getComputedStyle(el).overflowY) && el.clientHeight > 200)
        .map((el) => el.scrollHeight),
    ),
  );

describe("the run page through a maintainer's day", () => {
  it('watches a small run finish and settle without a reload, and follows its error cell to the reason', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    const made = await pageApi(b.page)<{ status: number; body: { plan: { id: string } } }>('/plans', 'POST', {
      name: 'Roots on one release',
      description: 'Square and cube roots against complex.js 2.4.3, for the run page journey.',
      recipients: [],
      suites: SUITES,
      targets: [TARGET],
    });
    expect(made.status).toBe(201);
    await goTo(b.page, 'Plans');
    await b.page.getByRole('link', { name: /^Roots on one release/ }).click();
    await b.page.getByRole('button', { name: 'Run now: Roots on one release' }).click();
    await b.page.waitForURL(/\/runs\/[0-9a-f-]{36}$/);
    const runId = new URL(b.page.url()).pathname.split('/').pop()!;
    // The lead names the run by the short id the failure table's Run filter takes; what a check is
    // is the matrix heading's to say (it once said both, "2 checks, each suite against each library version").
    await b.page.getByText(`Run ${shortRunId(runId)} of this plan.`, { exact: true }).waitFor();

    // The header's verdict and the matrix agree once the run ends, with no reload in between.
    await b.page
      .getByLabel(/^status: completed/)
      .first()
      .waitFor({ timeout: 60_000 });
    await b.page.getByText('2 of 2 done').waitFor();
    await b.page
      .getByTestId('run-check-tally')
      .getByText(/◊ 1 stopped by an error/)
      .waitFor();
    await b.page
      .getByTestId('matrix-summary')
      .getByText(/◊ 1 stopped by an error/)
      .waitFor();
    expect(await b.page.getByText(/waiting its turn|running now/).count()).toBe(0);
    expect(await b.page.getByText(/of this run checked nothing/).textContent()).toMatch(/^• 1 check of this run/);

    // The error cell says why, and leads to the target's page rather than to an empty failure table.
    const errorCell = b.page.getByTestId(`cell-cbrt-principal-sz-${TARGET}`);
    // The visible line (an off-screen sentence for screen readers says the same before it).
    await errorCell.getByText(/− \d+ skipped: .*has no cbrt/).waitFor();
    expect(await errorCell.getAttribute('href')).toBe(`/libraries/target?name=${encodeURIComponent(TARGET)}`);
    await saveScreenshots(b.page, 'day-run-page-small-run', () => errorCell.waitFor());
    await errorCell.click();
    await b.page.waitForURL(/\/libraries\/target\?name=/);
    await b.page.getByText('Convention fingerprint', { exact: false }).first().waitFor();
  });

  it('sees one verdict for a run whose library lacks a function: on the run page, the runs list, the Overview and the plan page', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    // exp-principal-ccw passes every point on complex.js 2.4.3; its cbrt check checks nothing. By
    // its points alone the run read "✓ all checked points passed" on the runs list and the Overview.
    const api = pageApi(b.page);
    const made = await api<{ status: number; body: { plan: { id: string } } }>('/plans', 'POST', {
      name: 'Exponential and cube root',
      description: 'One suite that passes and one whose function the library lacks, for the verdict journey.',
      recipients: [],
      suites: ['exp-principal-ccw', 'cbrt-principal-sz'],
      targets: [TARGET],
    });
    expect(made.status).toBe(201);
    const planId = made.body.plan.id;
    const started = await api<{ body: { run: { id: string } } }>('/runs', 'POST', { planId });
    const runId = started.body.run.id;
    const sameVerdict = async (where: ReturnType<Page['getByTestId']>) => {
      await where.getByText('◊ completed with errors', { exact: true }).waitFor();
      await where.getByText('1 check stopped by an error', { exact: true }).waitFor();
      expect(await where.getByText(/all checked points passed/).count()).toBe(0);
    };

    await b.page.goto(`${BASE_URL}/runs/${runId}`);
    await b.page.getByLabel('status: completed with errors').waitFor({ timeout: 60_000 });
    await sameVerdict(b.page.getByTestId('run-header'));
    await b.page
      .getByTestId('run-check-tally')
      .getByText(/◊ 1 stopped by an error/)
      .waitFor();

    await goTo(b.page, 'Runs');
    await sameVerdict(b.page.getByTestId(`run-${runId}`));
    await b.page.setViewportSize({ width: 1440, height: 900 });
    // The wide screen's table row (role row, a link to the run) in place of the phone's card.
    const row = b.page.getByRole('row', { name: /^Run of Exponential and cube root, / });
    await sameVerdict(row);
    expect(await row.getAttribute('aria-label')).toMatch(
      /^Run of Exponential and cube root, completed with errors, 1 check stopped by an error, /,
    );
    await saveScreenshots(b.page, 'day-run-page-verdict-runs-list', () => b.page.getByTestId(`run-${runId}`).waitFor());

    await goTo(b.page, 'Overview');
    await sameVerdict(b.page.getByTestId('plan-Exponential and cube root'));
    await saveScreenshots(b.page, 'day-run-page-verdict-overview', () =>
      b.page.getByTestId('plan-Exponential and cube root').waitFor(),
    );

    await b.page.goto(`${BASE_URL}/plans/${planId}`);
    await sameVerdict(b.page.getByTestId('plan-latest-run'));
    // The findings picture's "No findings" stands beside the check that checked nothing.
    await b.page.getByText('No findings in its completed run.').waitFor();
    await b.page
      .getByTestId('findings-by-kind-stopped')
      .getByText(/: 1 check stopped by an error in the run of /)
      .waitFor();
    await saveScreenshots(b.page, 'day-run-page-verdict-plan', () => b.page.getByTestId('plan-latest-run').waitFor());
  });

  it('filters the failure table by the short id a run shows, and says beside the field when it names no run', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    const runs = await pageApi(b.page)<{ body: { runs: { id: string; counts: { fail: number } }[] } }>(
      '/runs?status=completed&limit=25',
    );
    const failing = runs.body.runs.find((r) => r.counts.fail > 0)!;
    await b.page.goto(`${BASE_URL}/failures?run=${shortRunId(failing.id)}`);
    await b.page.getByText(/^\d+ failures? shown/).waitFor();
    expect(await b.page.getByText(/no run|more than one run/).count()).toBe(0);

    await b.page.goto(`${BASE_URL}/failures?run=ffffffff`);
    await b.page.getByText('× Run id names no run ("ffffffff")').waitFor();
    await b.page.getByText('× No failures shown: change the filter marked above.').waitFor();
    await saveScreenshots(b.page, 'day-run-page-run-filter', () =>
      b.page.getByText('× Run id names no run ("ffffffff")').waitFor(),
    );
  });

  it("shows a phone the verdict and the checks that need a look first on the demo's largest run", async () => {
    await signIn(b.page, kwame.email, kwame.password);
    const runs = await pageApi(b.page)<{ body: { runs: { id: string; shardsTotal: number }[] } }>(
      '/runs?status=completed&limit=25',
    );
    const largest = [...runs.body.runs].sort((x, y) => y.shardsTotal - x.shardsTotal)[0]!;
    await b.page.setViewportSize({ width: 390, height: 844 });
    await b.page.goto(`${BASE_URL}/runs/${largest.id}`);
    const firstCell = b.page.locator('[data-testid^="cell-"]').first();
    await firstCell.waitFor();
    await b.page.getByText('Property checks', { exact: true }).waitFor();
    await b.page.getByTestId('property-summary').waitFor();
    const height = await screenHeight(b.page);
    // The figure the report quotes: 30,851 px on the same run before the matrix folded (issue 15).
    console.log(`run page at 390×844 on the largest demo run (${largest.shardsTotal} checks): ${height} px`);
    expect(height).toBeLessThan(15_000);
    // The verdict is in the first screenful.
    const badge = await b.page
      .getByLabel(/^status: /)
      .first()
      .boundingBox();
    expect(badge!.y).toBeLessThan(844);
    const fold = b.page.getByRole('button', { name: /^\d+ suites? passed on every library version: show (it|them)$/ });
    expect(await fold.count()).toBe(1);
    await saveScreenshots(b.page, 'day-run-page-largest-run', () => firstCell.waitFor());
    await fold.click();
    const hide = b.page.getByRole('button', { name: /^\d+ suites? passed on every library version: hide (it|them)$/ });
    await hide.waitFor();
    expect(await hide.getAttribute('aria-expanded')).toBe('true');
  });

  it("shows a wide screen every failed and stopped check and every failed law of the demo's largest run without a tap", async () => {
    await signIn(b.page, kwame.email, kwame.password);
    const api = pageApi(b.page);
    const runs = await api<{ body: { runs: { id: string; shardsTotal: number }[] } }>(
      '/runs?status=completed&limit=25',
    );
    const largest = [...runs.body.runs].sort((x, y) => y.shardsTotal - x.shardsTotal)[0]!;
    const matrix = await api<{ body: { cells: { suite: string; target: string; outcome: string | null }[] } }>(
      `/runs/${largest.id}/matrix`,
    );
    await b.page.setViewportSize({ width: 1440, height: 900 });
    await b.page.goto(`${BASE_URL}/runs/${largest.id}`);
    await b.page.locator('[data-testid^="cell-"]').first().waitFor();
    await b.page.getByTestId('property-summary').waitFor();
    const height = await screenHeight(b.page);
    // 19,472 px on the same run before the wide matrix and property checks were made compact
    // (every detail a line, every law's statement above its evidence, each library version apart).
    console.log(`run page at 1440×900 on the largest demo run (${largest.shardsTotal} checks): ${height} px`);
    expect(height).toBeLessThan(12_000);
    const needing = matrix.body.cells.filter((c) => c.outcome === 'fail' || c.outcome === 'error');
    expect(needing.length).toBeGreaterThan(0);
    for (const c of needing) expect(await b.page.getByTestId(`cell-${c.suite}-${c.target}`).isVisible()).toBe(true);
    // Only groups whose every law held fold on a wide screen: each failed law is open as the page
    // loads, once per suite where its library versions failed it alike.
    const laws = await api<{ body: { properties: { suite: string; outcome: { kind: string; law: string } }[] } }>(
      `/runs/${largest.id}/properties`,
    );
    const failed = new Set(
      laws.body.properties.filter((p) => p.outcome.kind === 'failed').map((p) => `${p.suite} ${p.outcome.law}`),
    );
    expect(failed.size).toBeGreaterThan(0);
    const shown = b.page.getByText('❌ failed', { exact: true });
    expect(await shown.count()).toBeGreaterThanOrEqual(failed.size);
    expect(await shown.last().isVisible()).toBe(true);
    expect(await b.page.getByRole('button', { name: /failed|not checked/ }).count()).toBe(0);
  });
});
