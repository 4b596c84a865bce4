import { DEMO_USERS } from '../../server/seed/demo-users';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { pageApi } from './support/page-api';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();

const hanne = DEMO_USERS.find((u) => u.email === 'hanne@sheetkeeper.test')!;
const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;

/** A GET of the API as the signed-in page sees it: the answer's body. */
const api = async <T>(path: string): Promise<T> => (await pageApi(b.page)<{ body: T }>(path)).body;

/** The expiry the reviewer gives: far enough ahead that the run of this file never sees it pass. */
const EXPIRY = '2099-01-31';

describe('a day of decisions (issue 15, point 4)', () => {
  it('a reviewer accepts a deviation on a case, sees it on the case, the table and the Decisions screen, then revokes it', async () => {
    await signIn(b.page, hanne.email, hanne.password);
    // A zero-sign failure of the newest run that no decision covers yet (the seed decided one path).
    const runs = await api<{ runs: { id: string; status: string }[] }>('/runs?limit=5');
    const runId = runs.runs.find((r) => r.status === 'completed')!.id;
    const page = await api<{
      failures: { id: string; targetName: string; suiteSlug: string; pathName: string }[];
      decisions: Record<string, unknown>;
    }>(`/failures?run=${runId}&diagnosis=zero-sign&limit=50`);
    const f = page.failures.find((row) => !page.decisions[row.id])!;
    const version = f.targetName.split('@')[1]!;

    await b.page.goto(`${BASE_URL}/failures/${f.id}`);
    await b.page.getByText('Decisions on this failure').waitFor({ timeout: 20_000 });
    await b.page.getByText(/^No decision covers this failure/).waitFor();

    // The accepted chip is marked chosen (a drawn ring) only once chosen, and never carries a ✓.
    const accepted = b.page.getByRole('radio', { name: 'Verdict: accepted deviation' });
    expect(await accepted.textContent()).toBe('accepted deviation');
    expect(await accepted.getByTestId('chosen-mark').count()).toBe(0);
    await accepted.click();
    expect(await accepted.getAttribute('aria-checked')).toBe('true');
    expect(await accepted.textContent()).toBe('accepted deviation');
    expect(await accepted.getByTestId('chosen-mark').count()).toBe(1);

    // The scope in words before saving: which failures, which library, which versions.
    await b.page.getByRole('radio', { name: 'Covers: this path' }).click();
    await b.page.getByRole('radio', { name: `Versions of complex.js: ${version} and later` }).click();
    const said = `Saving covers every failure on path “${f.pathName}” of suite ${f.suiteSlug} on complex.js ${version} and every later version.`;
    await b.page.getByText(said).waitFor();

    // A badly written day is answered in the field's words, not with a timestamp format.
    await b.page.getByLabel('Reason').fill('complex.js documents that it does not keep the sign of zero here.');
    await b.page.getByLabel(/Expires on/).fill('31/01/2027');
    await b.page.getByRole('button', { name: 'Accept deviation' }).click();
    await b.page.getByText('× Expiry day must be a day written like 2027-01-31 (year-month-day)').waitFor();
    expect(await b.page.getByText(/T00:00:00Z/).count()).toBe(0);
    await b.page.getByLabel(/Expires on/).fill(EXPIRY);
    await b.page.getByRole('button', { name: 'Accept deviation' }).click();
    await b.page.getByText(/^✓ Recorded: accepted deviation covering every failure on path/).waitFor();

    // On the case: which decision covers it, by whom, until when, with a link to it.
    const onCase = b.page.locator('[data-testid^="decision-"]').first();
    await onCase.getByText(`in force until ${EXPIRY}`, { exact: false }).waitFor();
    await onCase.getByText(/^Decided by Hanne Lindqvist on/).waitFor();
    await saveScreenshots(b.page, 'decisions-case', () => b.page.getByText('Decisions on this failure').waitFor());

    // On the table: the row carries the decision's mark.
    await b.page.goto(`${BASE_URL}/failures?run=${runId}&diagnosis=zero-sign`);
    const card = b.page.locator(`[data-testid="failure-card-${f.id}"]`);
    await card.getByText(`accepted until ${EXPIRY}`, { exact: true }).waitFor({ timeout: 20_000 });
    await saveScreenshots(b.page, 'decisions-table', () => b.page.getByText(/failures? shown/).waitFor());

    // From the case to the decision on the Decisions screen.
    await b.page.goto(`${BASE_URL}/failures/${f.id}`);
    await b.page.getByRole('link', { name: 'Open this decision on the Decisions screen' }).first().click();
    await b.page.waitForURL(/\/decisions\?id=/);
    await b.page.getByRole('link', { name: '← Every decision' }).waitFor();

    // The whole list: the new decision in force, the seed's expired one still listed as expired.
    await goTo(b.page, 'Decisions');
    await b.page.waitForURL(/\/decisions$/);
    const row = b.page.locator('[data-testid^="decision-"]', { hasText: `in force until ${EXPIRY}` }).first();
    await row.waitFor({ timeout: 20_000 });
    await row.getByText(said.replace('Saving covers', 'Covers')).waitFor();
    await b.page
      .getByText(/expired on \d{4}-\d{2}-\d{2}: no longer applies/)
      .first()
      .waitFor();
    await b.page.getByRole('radio', { name: 'Library: complex.js' }).click();
    await b.page.waitForURL(/library=complex\.js/);
    await saveScreenshots(b.page, 'decisions-screen', () => b.page.getByText(/^\d+ decisions?:/).waitFor());

    // Revoke, asked twice, then said; it stays listed as revoked, and the table loses its mark.
    const target = b.page.locator('[data-testid^="decision-"]', { hasText: `in force until ${EXPIRY}` }).first();
    await target.getByRole('button', { name: /^Revoke the accepted deviation on / }).click();
    await target.getByText(/^Revoke this accepted deviation\?/).waitFor();
    await target.getByRole('button', { name: 'Yes, revoke' }).click();
    await b.page.getByText(/^✓ Revoked: the accepted deviation on .* no longer applies/).waitFor();
    await b.page
      .getByText(/revoked on \d{4}-\d{2}-\d{2}: no longer applies/)
      .first()
      .waitFor();
    const after = await api<{ decisions: Record<string, unknown> }>(
      `/failures?run=${runId}&diagnosis=zero-sign&limit=50`,
    );
    expect(after.decisions[f.id]).toBeUndefined();
  });

  it('a maintainer reads the decisions, expired and revoked ones included, and may not revoke', async () => {
    await b.page.setViewportSize({ width: 1440, height: 900 });
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Decisions');
    await b.page.getByText(/^\d+ decisions?:/).waitFor({ timeout: 20_000 });
    await b.page
      .getByText(/expired on \d{4}-\d{2}-\d{2}: no longer applies/)
      .first()
      .waitFor();
    await b.page
      .getByText(/^Decided by Hanne Lindqvist on/)
      .first()
      .waitFor();
    expect(await b.page.getByRole('button', { name: /^Revoke/ }).count()).toBe(0);
    expect(await b.page.title()).toBe('Decisions · Sheetkeeper');
  });
});
