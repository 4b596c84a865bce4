import { readFileSync } from 'node:fs';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { DIAGNOSIS_KIND_NAMES } from '../../shared/diagnosis-kind-names';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();
const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
/** A bar of the picture, as a screen reader reads it: "31 ignored zero sign in the run of …: open these failures". */
const BAR = /^(\d+) (.+) in the run of .+: open these failures$/;

describe('findings by kind: the plan picture and the regression mail summary', () => {
  it("lets kwame read the nightly plan's findings by kind across its runs and open one run's failures of one kind", async () => {
    const kwame = demo('maintainer');
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Plans');
    await b.page.getByRole('link', { name: /^complex\.js nightly/ }).click();
    const picture = b.page.getByTestId('findings-by-kind');
    await picture.getByText('Branch findings').waitFor();
    await saveScreenshots(b.page, 'plan-findings-by-kind', () => picture.getByText('Branch findings').waitFor());

    // axe-core over the picture: no serious or critical violation (contrast included). Evaluated
    // through the debugging protocol, which the app's Content Security Policy does not govern.
    await b.page.evaluate(readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8'));
    const violations = await b.page.evaluate(async () => {
      const axe = (
        window as unknown as {
          axe: { run: (c: string) => Promise<{ violations: { id: string; impact: string; nodes: unknown[] }[] }> };
        }
      ).axe;
      const result = await axe.run('[data-testid="findings-by-kind"]');
      return result.violations
        .filter((v) => v.impact === 'serious' || v.impact === 'critical')
        .map((v) => `${v.id} (${v.nodes.length})`);
    });
    expect(violations).toEqual([]);

    // Every row names its kind with its counts, oldest run first; branch kinds come before accuracy.
    const rows = await picture
      .getByLabel(/, oldest run first: /)
      .evaluateAll((els) => els.map((e) => e.getAttribute('aria-label')!));
    const kinds = rows.map((r) => DIAGNOSIS_KINDS.find((k) => r.startsWith(`${DIAGNOSIS_KIND_NAMES[k].name}, `))!);
    expect(kinds.every(Boolean)).toBe(true);
    expect(kinds).toEqual(DIAGNOSIS_KINDS.filter((k) => kinds.includes(k)));
    // The seed's two completed runs (more if another journey ran the plan) are columns, oldest on the left.
    expect(rows.every((r) => r.split(': ')[1]!.split(', ').length >= 2)).toBe(true);

    // A bar leads to that run's failures of that kind, and the table shows as many as the bar says.
    const bar = picture.getByRole('link', { name: BAR }).last();
    const [, count, name] = BAR.exec((await bar.getAttribute('aria-label'))!)!;
    const kind = DIAGNOSIS_KINDS.find((k) => DIAGNOSIS_KIND_NAMES[k].name === name)!;
    await bar.click();
    await b.page.waitForURL((url) => url.pathname === '/failures' && url.searchParams.get('diagnosis') === kind);
    const run = new URL(b.page.url()).searchParams.get('run')!;
    expect(run).toMatch(/^[0-9a-f-]{36}$/);
    const table = await b.page.evaluate(
      async ([r, k]) => (await (await fetch(`/api/failures?run=${r}&diagnosis=${k}&limit=500`)).json()).failures.length,
      [run, kind],
    );
    expect(table).toBe(Math.min(Number(count), 500));
    await b.page
      .getByLabel(new RegExp(`^diagnosis ${name}`))
      .first()
      .waitFor();
  });

  it('shows odile the demo regression mail in the Outbox with its summary by kind before any table', async () => {
    const odile = demo('admin');
    await signIn(b.page, odile.email, odile.password);
    await goTo(b.page, 'Outbox');
    const mail = b.page.getByRole('link', { name: /^\[Sheetkeeper\] \d+ regressions? in complex\.js nightly/ }).first();
    await mail.waitFor();
    await mail.click();
    const inside = b.page.frameLocator('[data-testid="mail-html-frame"]');
    await inside.getByRole('heading', { name: 'Summary' }).waitFor();
    await saveScreenshots(b.page, 'regression-mail-summary', () =>
      inside.getByRole('heading', { name: 'Summary' }).waitFor(),
    );
    const body = await inside.locator('body').innerText();
    const summary = body.indexOf('Summary');
    expect(summary).toBeGreaterThan(0);
    expect(summary).toBeLessThan(body.indexOf('Input'));
    expect(body.indexOf('All ')).toBeLessThan(body.indexOf('Input'));
    // Each kind in the summary links to the run's regressions of that kind.
    const links = await inside
      .getByRole('link')
      .evaluateAll((els) => els.map((e) => (e as HTMLAnchorElement).getAttribute('href')!));
    expect(links.some((h) => /\/failures\?run=[0-9a-f-]{36}&status=new&diagnosis=[a-z-]+$/.test(h))).toBe(true);

    await b.page.getByRole('tab', { name: 'Plain text' }).click();
    const text = (await b.page.getByTestId('mail-text').textContent())!;
    expect(text.indexOf('Summary by kind')).toBeGreaterThan(0);
    expect(text.indexOf('Summary by kind')).toBeLessThan(text.indexOf('  input     z ='));
  });
});
