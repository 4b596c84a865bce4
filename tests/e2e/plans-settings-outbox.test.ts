import nodemailer from 'nodemailer';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { goTo } from './support/go-to';
import { BASE_URL, openBrowser, type OpenBrowser } from './support/open-browser';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

let b: OpenBrowser;
/** The app's CSP must let the Outbox show mail in a sandboxed frame: any CSP refusal fails the journey. */
let cspReports: string[];
beforeEach(async () => {
  b = await openBrowser();
  cspReports = [];
  b.page.on('console', (message) => {
    if (/Content Security Policy/i.test(message.text())) cspReports.push(message.text());
  });
});
afterEach(async () => {
  const errors = [...b.pageErrors];
  await b.close();
  expect(errors).toEqual([]);
  expect(cspReports).toEqual([]);
});

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

describe('plans and schedules', () => {
  it('lets kwame change a schedule, seeing the rule for a bad expression and the next three times as he types', async () => {
    const kwame = demo('maintainer');
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Plans');
    const card = b.page.getByRole('link', { name: /^complex\.js nightly/ });
    await card.waitFor();
    await saveScreenshots(b.page, 'plans', () => card.waitFor());
    await card.click();

    const schedules = b.page.getByTestId('plan-schedules');
    await schedules.getByText('30 2 * * *', { exact: true }).waitFor();
    await saveScreenshots(b.page, 'plan-detail', () => schedules.getByText('30 2 * * *', { exact: true }).waitFor());
    await b.page.getByRole('button', { name: 'Edit schedule 30 2 * * *' }).click();

    const cron = b.page.getByLabel('Cron expression', { exact: true });
    await cron.fill('61 2 * * *');
    await b.page.getByText('× Cron expression has an invalid minute field: "61"').waitFor();
    await cron.fill('15 6 * * 1');
    const nextRuns = b.page.getByTestId('schedule-next-runs');
    await nextRuns
      .getByText(/^Mon .*06:15$/)
      .nth(2)
      .waitFor();
    expect(await b.page.getByText(/× Cron expression/).count()).toBe(0);
    expect(await nextRuns.getByText(/06:15$/).count()).toBe(3);
    await saveScreenshots(b.page, 'schedule-editor', () =>
      nextRuns
        .getByText(/06:15$/)
        .nth(2)
        .waitFor(),
    );

    const [patch] = await Promise.all([
      b.page.waitForResponse((r) => r.url().includes('/api/schedules/') && r.request().method() === 'PATCH'),
      b.page.getByRole('button', { name: 'Save schedule' }).click(),
    ]);
    expect(patch.status()).toBe(200);
    await schedules.getByText('15 6 * * 1', { exact: true }).waitFor();

    // Pausing shows at once and reaches the server.
    const toggle = b.page.getByRole('switch', { name: 'Schedule 15 6 * * 1 runs' });
    const [paused] = await Promise.all([
      b.page.waitForResponse((r) => r.url().includes('/api/schedules/') && r.request().method() === 'PATCH'),
      toggle.click(),
    ]);
    expect(paused.status()).toBe(200);
    await b.page.getByRole('switch', { name: 'Schedule 15 6 * * 1 runs', checked: false }).waitFor();
    await schedules.getByText('Paused: this schedule starts no runs until it is turned on again.').waitFor();
    const stored = await b.page.evaluate(() => fetch('/api/schedules').then((r) => r.json()));
    expect(stored.schedules.find((s: { cron: string }) => s.cron === '15 6 * * 1')?.enabled).toBe(false);
  });

  it('lets kwame make a plan of one approved suite and one target, refusing it empty first, and run it now', async () => {
    const kwame = demo('maintainer');
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Plans');
    await b.page.getByRole('link', { name: 'New plan' }).click();
    await b.page.getByLabel('Name', { exact: true }).fill('One root on one target');
    await b.page.getByLabel('Recipients', { exact: true }).fill('kwame@sheetkeeper.test, not-an-address');
    await b.page.getByRole('button', { name: 'Create plan' }).click();
    await b.page.getByText('× Recipients “not-an-address” must be an e-mail address').waitFor();
    await b.page.getByText('× Suites needs at least one suite').waitFor();
    await b.page.getByText('× Targets needs at least one target').waitFor();
    await saveScreenshots(b.page, 'plan-new-invalid', () =>
      b.page.getByText('× Suites needs at least one suite').waitFor(),
    );

    await b.page.getByLabel('Recipients', { exact: true }).fill('kwame@sheetkeeper.test');
    await b.page.getByLabel('Filter suites').fill('sqrt-principal-sz');
    await b.page.getByRole('checkbox', { name: 'Square root, principal branch, signed zeros (Annex G)' }).click();
    await b.page.getByLabel('Filter targets').fill('complex.js@2.4.3');
    await b.page.getByRole('checkbox', { name: 'complex.js@2.4.3', exact: true }).click();
    expect(await b.page.getByLabel('Name', { exact: true }).inputValue()).toBe('One root on one target');
    await b.page.getByRole('button', { name: 'Create plan' }).click();

    await b.page.getByTestId('plan-detail').waitFor();
    expect(new URL(b.page.url()).pathname).toMatch(/^\/plans\/[0-9a-f-]{36}$/);
    await b.page.getByText('Checks 1 suite × target pair now: approved suites on installed targets.').waitFor();
    const [started] = await Promise.all([
      b.page.waitForResponse((r) => r.url().endsWith('/api/runs') && r.request().method() === 'POST'),
      b.page.getByRole('button', { name: 'Run now: One root on one target' }).click(),
    ]);
    expect(started.status()).toBe(202);
    const { run } = await started.json();
    await b.page.waitForURL((url) => url.pathname === `/runs/${run.id}`);
  });
});

describe('settings', () => {
  it('shows a new token once, which then works in CI until kwame revokes it', async () => {
    const kwame = demo('maintainer');
    await signIn(b.page, kwame.email, kwame.password);
    await goTo(b.page, 'Settings');
    await b.page.getByTestId('subscription-list').waitFor();
    // At 390 px a long library name wraps after a slash, never inside a word: each part stays on one line.
    const heights = await b.page
      .getByTestId('name-mathjs/number/predictable')
      .locator(':scope > *')
      .evaluateAll((parts) => parts.map((p) => p.getBoundingClientRect().height));
    expect(heights).toHaveLength(3);
    expect(Math.max(...heights)).toBeLessThan(1.5 * Math.min(...heights));
    await b.page.getByLabel('Token name', { exact: true }).fill('e2e pipeline');
    await b.page.getByRole('button', { name: 'Make token' }).click();
    const secretText = b.page.getByTestId('new-token-secret-value');
    await secretText.waitFor();
    await b.page.getByText('Copy it now: you will not see this again.', { exact: false }).waitFor();
    const secret = (await secretText.textContent())!.trim();
    expect(secret).toMatch(/^skt_[A-Za-z0-9_-]{20,}$/);
    await b.page.getByTestId('token-e2e pipeline').waitFor();
    await saveScreenshots(b.page, 'settings-new-token', () => secretText.waitFor());

    // The CI example names the header the server reads.
    expect(await b.page.getByTestId('ci-example-curl').textContent()).toContain(
      'Authorization: Bearer $SHEETKEEPER_TOKEN',
    );
    const withToken = (token: string) =>
      fetch(`${BASE_URL}/api/runs`, { headers: { authorization: `Bearer ${token}` } }).then((r) => r.status);
    expect(await withToken(secret)).toBe(200);

    await b.page.getByRole('button', { name: 'I have stored it' }).click();
    await b.page.reload();
    await b.page.getByTestId('token-e2e pipeline').waitFor();
    expect(await b.page.content()).not.toContain(secret);
    await b.page
      .getByTestId('token-e2e pipeline')
      .getByText(/· last used /)
      .waitFor();
    await saveScreenshots(b.page, 'settings', () => b.page.getByTestId('token-e2e pipeline').waitFor());

    await b.page.getByRole('button', { name: 'Revoke token e2e pipeline' }).click();
    const [revoked] = await Promise.all([
      b.page.waitForResponse((r) => r.url().endsWith('/revoke') && r.request().method() === 'POST'),
      b.page.getByRole('button', { name: 'Yes, revoke' }).click(),
    ]);
    expect(revoked.status()).toBe(200);
    await b.page
      .getByTestId('token-e2e pipeline')
      .getByText(/^− Revoked /)
      .waitFor();
    expect(await withToken(secret)).toBe(401);
  });
});

describe('outbox', () => {
  it('lets odile read a received message rendered in a sandbox, and its plain text', async () => {
    const port = Number(process.env.SHEETKEEPER_E2E_SMTP_PORT);
    expect(port).toBeGreaterThan(0);
    const transport = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
    const subject = `Regressions in nightly ${Date.now()}`;
    await transport.sendMail({
      from: 'Sheetkeeper <sheetkeeper@localhost>',
      to: 'kwame@sheetkeeper.test',
      subject,
      text: 'Two points that passed yesterday fail today.\nasin at 1.5+0i: cut-side',
      html: `<h1 style="font-family: sans-serif">Two points regressed</h1><p>asin at <code>1.5+0i</code>: cut-side</p><p><a href="https://example.org/elsewhere">a link</a></p><script>document.body.innerHTML = 'SCRIPT RAN'</script>`,
    });
    transport.close();

    const odile = demo('admin');
    await signIn(b.page, odile.email, odile.password);
    await goTo(b.page, 'Outbox');
    const row = b.page.getByRole('link', { name: subject });
    await row.waitFor();
    await saveScreenshots(b.page, 'outbox', () => row.waitFor());
    await row.click();

    const frame = b.page.getByTestId('mail-html-frame');
    await frame.waitFor();
    expect(await frame.getAttribute('sandbox')).toBe('');
    const inside = b.page.frameLocator('[data-testid="mail-html-frame"]');
    await inside.getByText('Two points regressed').waitFor();
    expect(await inside.getByText('SCRIPT RAN').count()).toBe(0);
    await saveScreenshots(b.page, 'outbox-message', () => inside.getByText('Two points regressed').waitFor());

    await b.page.getByRole('tab', { name: 'Plain text' }).click();
    await b.page.getByTestId('mail-text').getByText('asin at 1.5+0i: cut-side', { exact: false }).waitFor();
    expect(await b.page.getByTestId('mail-html-frame').count()).toBe(0);
    await saveScreenshots(b.page, 'outbox-message-text', () => b.page.getByTestId('mail-text').waitFor());
  });

  it("shows the demo data's regression mail rendered, as the team would read it", async () => {
    const odile = demo('admin');
    await signIn(b.page, odile.email, odile.password);
    await goTo(b.page, 'Outbox');
    const mail = b.page.getByRole('link', { name: /\[Sheetkeeper\] \d+ regressions? in / }).first();
    await mail.waitFor();
    await mail.click();
    const inside = b.page.frameLocator('[data-testid="mail-html-frame"]');
    await inside
      .locator('body')
      .getByText(/regression/i)
      .first()
      .waitFor();
    await saveScreenshots(b.page, 'outbox-regression-mail', () =>
      inside
        .locator('body')
        .getByText(/regression/i)
        .first()
        .waitFor(),
    );
  });
});
