import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { signIn } from './support/sign-in';

const b = browserPerTest();
const ravi = DEMO_USERS.find((u) => u.email === 'ravi@sheetkeeper.test')!;

/** Chooses a file in the browser's picker that the button opens (expo-document-picker on the web). */
async function upload(
  page: Page,
  button: string,
  file: { name: string; mimeType: string; text: string },
): Promise<void> {
  const [chooser] = await Promise.all([
    page.waitForEvent('filechooser'),
    page.getByRole('button', { name: button }).click(),
  ]);
  await chooser.setFiles({ name: file.name, mimeType: file.mimeType, buffer: Buffer.from(file.text) });
}

describe('uploads through the file picker', () => {
  it('refuses a malformed suite file field by field, takes a good one as a draft, then checks a reference CSV against it', async () => {
    await signIn(b.page, ravi.email, ravi.password);
    await goTo(b.page, 'Suites');

    await upload(b.page, 'Upload a suite file', {
      name: 'broken.json',
      mimeType: 'application/json',
      text: JSON.stringify({ id: 'Not A Slug', subject: 'sqrt(z' }),
    });
    const issues = b.page.getByTestId('suite-upload-issues');
    // Fields are named in the form's words ("Id", "Title"), not as keys (suite upload, fieldLabel).
    await issues.getByText(/Id/).first().waitFor();
    expect(await issues.textContent()).toMatch(/Title/);

    const demo = JSON.parse(
      readFileSync(path.join(__dirname, '..', '..', 'suites', 'demo', 'sqrt-principal-sz.json'), 'utf8'),
    );
    const mine = { ...demo, id: 'uploaded-sqrt-check', title: 'Square root, uploaded from a file' };
    await upload(b.page, 'Upload a suite file', {
      name: 'uploaded-sqrt-check.json',
      mimeType: 'application/json',
      text: JSON.stringify(mine),
    });
    await b.page.waitForURL(/\/suites\/uploaded-sqrt-check$/);
    await b.page.getByText('Square root, uploaded from a file').first().waitFor();

    // ISO/IEC 9899:2011 G.6.4.2: csqrt(conj(z)) = conj(csqrt(z)), so sqrt(−4 − 0i) = 0 − 2i and
    // sqrt(−4 + 0i) = 0 + 2i; the second line claims the wrong side of the cut.
    const csv = [
      'z_re,z_im,expected_re,expected_im,source',
      '-4,-0,0,-2,ISO C Annex G',
      '-4,0,0,-2,a table with the wrong side',
    ].join('\n');
    await upload(b.page, 'Upload a reference CSV', { name: 'sqrt.csv', mimeType: 'text/csv', text: csv });
    const check = b.page.getByTestId('reference-check');
    await check.getByText(/2 rows read, 1 agree, 1 disagree/).waitFor();
    await check.getByText(/≠ line 3/).waitFor();
  }, 90_000);
});
