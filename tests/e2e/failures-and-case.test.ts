import { DEMO_USERS } from '../../server/seed/demo-users';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();

const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;

/** The API as the signed-in page sees it (plain promise chains: the page has no babel helpers). */
const api = <T>(path: string): Promise<T> =>
  b.page.evaluate((p) => fetch('/api' + p).then((res) => res.json()), path) as Promise<T>;

describe('the failure table and a case', () => {
  it('filters the table in the address, opens a zero-sign case with its pictures and accepts the deviation as a maintainer', async () => {
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Failures');
    const firstCard = b.page.locator('[data-testid^="failure-card-"]').first();
    await firstCard.waitFor({ timeout: 20_000 });
    await b.page.getByText(/failures? shown/).waitFor();

    // On a phone the filters fold behind one button; a chip applies at once and lands in the address.
    await b.page.getByRole('button', { name: /^Filters/ }).click();
    await b.page.getByRole('radio', { name: 'Diagnosis: ignored zero sign' }).click();
    await b.page.waitForURL(/diagnosis=zero-sign/);
    await b.page.getByRole('button', { name: /^Filters/ }).click();
    const card = b.page.locator('[data-testid^="failure-card-"]').first();
    await card.getByText('zero sign').first().waitFor();
    // The filter matches any label of a point, so every card carries a zero-sign chip (a point may carry others too).
    for (const text of await b.page.locator('[data-testid^="failure-card-"]').allTextContents())
      expect(text).toContain('zero sign');
    await saveScreenshots(b.page, 'failure-table', () => b.page.getByText(/failures? shown/).waitFor());

    // A link from elsewhere opens the table filtered by run and target.
    const { failures } = await api<{
      failures: { id: string; runId: string; targetName: string; suiteSlug: string }[];
    }>('/failures?diagnosis=zero-sign&limit=1');
    const f = failures[0]!;
    await b.page.goto(`${BASE_URL}/failures?run=${f.runId}&target=${encodeURIComponent(f.targetName)}`);
    await b.page.getByText(/failures? shown/).waitFor();
    await b.page.getByRole('button', { name: 'Filters, 2 on' }).click();
    expect(await b.page.getByLabel('Target', { exact: true }).inputValue()).toBe(f.targetName);
    const targets = await b.page.locator('[data-testid^="failure-card-"]').allTextContents();
    expect(targets.length).toBeGreaterThan(0);
    for (const text of targets) expect(text).toContain(f.targetName);

    // Open the zero-sign case.
    await b.page.goto(`${BASE_URL}/failures?diagnosis=zero-sign&run=${f.runId}`);
    await b.page.locator(`[data-testid="failure-card-${f.id}"]`).click();
    await b.page.waitForURL(new RegExp(`/failures/${f.id}$`));
    const plane = b.page.getByRole('img', { name: /The complex plane with the path/ });
    await plane.waitFor({ timeout: 30_000 });
    expect(await plane.locator('svg').count()).toBe(1);
    await b.page
      .getByRole('img', { name: /Argument of the expected and the library's value/ })
      .locator('svg')
      .waitFor();
    await b.page
      .getByRole('img', { name: /Error in ulps along the path/ })
      .locator('svg')
      .waitFor();

    await b.page.getByRole('button', { name: 'Copy reproducer' }).waitFor();
    await saveScreenshots(b.page, 'case-detail', () => plane.locator('svg').waitFor());
    const argPlot = b.page.getByText('Argument of the value along the path');
    await saveScreenshots(b.page, 'case-detail-plots', () => argPlot.scrollIntoViewIfNeeded());

    // Exact bits on demand.
    await b.page.getByRole('button', { name: 'Show exact bits' }).click();
    await b.page
      .getByText(/re -?0x/)
      .first()
      .waitFor();

    // Kwame, a maintainer, may accept the deviation (and only that).
    expect(await b.page.getByRole('radio', { name: 'Verdict: bug' }).count()).toBe(0);
    await b.page.getByRole('button', { name: 'Accept deviation' }).click();
    await b.page.getByText('× Reason must say why (at least 3 characters)').waitFor();
    await b.page.getByText('× Expiry day is required for an accepted deviation').waitFor();
    await b.page.getByLabel('Reason').fill('complex.js documents that it does not keep the sign of zero.');
    await b.page.getByLabel(/Expires on/).fill('2099-06-30');
    await b.page.getByRole('button', { name: 'Accept deviation' }).click();
    await b.page
      .getByText(/✓ Recorded: accepted deviation covering the point of failure #\d+ .* only, until 2099-06-30/)
      .waitFor();
    const accepted = await api<{ failures: { id: string }[] }>(`/failures?status=accepted&run=${f.runId}&limit=500`);
    expect(accepted.failures.map((a) => a.id)).toContain(f.id);
  });

  it('shows the table with a column chooser on a wide screen and remembers the choice', async () => {
    await b.page.setViewportSize({ width: 1440, height: 900 });
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Failures');
    await b.page.getByRole('table', { name: 'Failures' }).waitFor({ timeout: 20_000 });
    expect(await b.page.getByRole('columnheader', { name: 'Library' }).count()).toBe(0);
    await b.page.getByRole('button', { name: 'Choose columns' }).click();
    await b.page.getByRole('checkbox', { name: 'Show column Library' }).click();
    await b.page.getByRole('columnheader', { name: 'Library' }).waitFor();
    await b.page.reload();
    await b.page.getByRole('columnheader', { name: 'Library' }).waitFor({ timeout: 20_000 });
  });
});
