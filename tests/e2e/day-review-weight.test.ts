import { readFileSync } from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { BASE_URL } from './support/open-browser';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

jest.setTimeout(90_000);

const b = browserPerTest();
const user = (name: string) => DEMO_USERS.find((u) => u.email.startsWith(`${name}@`))!;
const SLUG = 'review-weight-sqrt-circle';
const TITLE = 'Square root once around the unit circle';
const demo = () =>
  JSON.parse(readFileSync(path.join(__dirname, '..', '..', 'suites', 'demo', 'sqrt-principal-sz.json'), 'utf8'));
/** The demo square-root suite whose first path is a circle of radius `radius`. */
const withRadius = (radius: string) => {
  const body = demo();
  body.paths[0] = { kind: 'circle', name: body.paths[0].name, center: { re: '0', im: '0' }, radius, samples: 16 };
  return { ...body, id: SLUG, title: TITLE };
};

async function upload(page: Page, file: { name: string; text: string }): Promise<void> {
  const [chooser] = await Promise.all([
    page.waitForEvent('filechooser'),
    page.getByRole('button', { name: 'Upload a suite file' }).click(),
  ]);
  await chooser.setFiles({ name: file.name, mimeType: 'application/json', buffer: Buffer.from(file.text) });
}

/** The bytes received for `url` over loopback before any decoding, and the answer's headers. */
function fetchRaw(url: string, encoding: string) {
  return new Promise<{ bytes: number; headers: http.IncomingHttpHeaders }>((resolve, reject) => {
    http
      .get(url, { headers: { 'Accept-Encoding': encoding } }, (res) => {
        let bytes = 0;
        res.on('data', (c: Buffer) => (bytes += c.length));
        res.on('end', () => resolve({ bytes, headers: res.headers }));
      })
      .on('error', reject);
  });
}

describe('a day of review: suites that check nothing, a deliberate decision, and a light app', () => {
  it('ravi writes a circle of radius -1: the form and the upload refuse it beside the field, in the form’s words', async () => {
    const { page } = b;
    const ravi = user('ravi');
    await signIn(page, ravi.email, ravi.password);
    await goTo(page, 'Suites');
    await upload(page, { name: 'radius-minus-one.json', text: JSON.stringify(withRadius('-1')) });
    const issues = page.getByTestId('suite-upload-issues');
    await issues.getByText(/Path 1 · radius/).waitFor();
    expect(await issues.textContent()).toContain(
      'Path 1 · radius must be greater than 0: with -1 the circle has no points',
    );
    expect(await issues.textContent()).not.toMatch(/paths\.\d/);
    await saveScreenshots(page, 'review-weight-upload-refused', () => issues.waitFor());

    await page.getByRole('link', { name: 'New suite' }).click();
    await page.getByLabel('Id', { exact: true }).fill(SLUG);
    await page.getByLabel('Title', { exact: true }).fill(TITLE);
    await page.getByLabel('Subject', { exact: true }).fill('sqrt(z)');
    await page.getByLabel('Path 1 radius', { exact: true }).fill('-1');
    const beside = page.getByText('× Radius must be greater than 0: with -1 the circle has no points');
    await beside.waitFor();
    await page.getByRole('button', { name: 'Save draft' }).click();
    const refused = page.getByTestId('suite-form-refused');
    await refused.waitFor();
    expect(await refused.textContent()).toContain('Path 1 · radius: must be greater than 0');
    expect(await page.evaluate((slug) => fetch(`/api/suites/${slug}`).then((r) => r.status), SLUG)).toBe(404);
    await saveScreenshots(page, 'review-weight-form-refused', () => beside.waitFor());

    // Radius 1 passes; saved and submitted, it waits for a reviewer.
    await page.getByLabel('Path 1 radius', { exact: true }).fill('1');
    await beside.waitFor({ state: 'detached' });
    await page.getByRole('button', { name: 'Save and submit for review' }).click();
    await page.getByLabel('version 1 submitted').first().waitFor();
  });

  it('hanne finds nothing preselected, is asked to choose, approves, and sees it confirmed with the queue updated', async () => {
    const { page } = b;
    const hanne = user('hanne');
    await signIn(page, hanne.email, hanne.password);
    await goTo(page, 'Review');
    await page.getByTestId(`suite-${SLUG}`).click();
    const radios = page.getByRole('radiogroup', { name: 'Decision' }).getByRole('radio');
    await radios.first().waitFor();
    expect(await radios.evaluateAll((els) => els.map((e) => e.getAttribute('aria-checked')))).toEqual([
      'false',
      'false',
    ]);
    await page.getByRole('button', { name: 'Send the decision on version 1' }).click();
    const ask = page.getByTestId('review-unchosen');
    await ask.waitFor();
    expect(await ask.textContent()).toBe('× Choose a decision first: approve, or request changes.');
    // Crossing the wide breakpoint mounts the screen again (save-screenshots.ts), which forgets the attempt.
    await saveScreenshots(page, 'review-weight-decision-unchosen', async () => {
      const send = page.getByRole('button', { name: 'Send the decision on version 1' });
      await send.waitFor();
      if (!(await ask.isVisible())) await send.click();
      await ask.waitFor();
    });

    await page.getByRole('radio', { name: 'Decision: approve' }).click();
    await page.getByLabel('Comment', { exact: true }).fill('One turn of the unit circle, both sides of the cut.');
    await page.getByRole('button', { name: 'Approve version 1' }).click();
    const confirmation = page.getByTestId('review-confirmation');
    await confirmation.waitFor();
    expect(await confirmation.textContent()).toBe(
      `Approved “${TITLE}” (${SLUG}, version 1). Plans that include it run this version from their next run.`,
    );
    await page.getByTestId(`suite-${SLUG}`).waitFor({ state: 'detached' });
    await saveScreenshots(page, 'review-weight-confirmation', () => confirmation.waitFor());
  });

  it('serves the app’s bundle compressed and cached for a year, and index.html revalidated', async () => {
    const index = await fetchRaw(`${BASE_URL}/`, 'gzip, deflate, br');
    expect(index.headers['cache-control']).toBe('no-cache');
    const html = await (await fetch(`${BASE_URL}/`)).text();
    const bundle = /src="(\/_expo\/static\/js\/web\/entry-[0-9a-f]{32}\.js)"/.exec(html)?.[1];
    expect(bundle).toBeDefined();
    const whole = await fetchRaw(`${BASE_URL}${bundle}`, 'identity');
    const brotli = await fetchRaw(`${BASE_URL}${bundle}`, 'gzip, deflate, br');
    const gzip = await fetchRaw(`${BASE_URL}${bundle}`, 'gzip, deflate');
    expect([brotli.headers['content-encoding'], gzip.headers['content-encoding']]).toEqual(['br', 'gzip']);
    expect(brotli.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    // 2,190,213 bytes whole, 532,995 gzip and 516,227 brotli on 5 December 2026.
    expect(gzip.bytes).toBeLessThan(whole.bytes / 3);
    expect(brotli.bytes).toBeLessThan(whole.bytes / 3);
    console.log(`bundle ${bundle}: ${whole.bytes} B whole, ${gzip.bytes} B gzip, ${brotli.bytes} B brotli`);

    // Time to the first useful screen after sign-in, the bundle from the browser's cache.
    const kwame = user('kwame');
    const started = Date.now();
    await signIn(b.page, kwame.email, kwame.password);
    console.log(`sign-in page to the signed-in Overview: ${Date.now() - started} ms`);
  });
});
