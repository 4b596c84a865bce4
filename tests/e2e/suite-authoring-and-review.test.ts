import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { goTo } from './support/go-to';
import { openBrowser, type OpenBrowser } from './support/open-browser';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';
import { signOut } from './support/sign-out';

jest.setTimeout(180_000);

let b: OpenBrowser;
beforeAll(async () => {
  b = await openBrowser();
});
afterAll(async () => {
  const errors = [...b.pageErrors];
  await b.close();
  expect(errors).toEqual([]);
});

const user = (name: string) => DEMO_USERS.find((u) => u.email.startsWith(`${name}@`))!;
const SLUG = 'cube-root-of-z-times-z-minus-1';
/** saveScreenshots ends at the phone size; wait for the tab bar so helpers see the phone layout, not the rail that is going away. */
const phoneLayout = (page: Page) => page.getByRole('link', { name: 'More', exact: true }).waitFor();
const fill = (page: Page, label: string, value: string) => page.getByLabel(label, { exact: true }).fill(value);

describe('writing a regular-branch suite and reviewing it', () => {
  it('ravi drafts (z(z−1))^(1/3): a finite cut is refused naming the loop, the fixed layout is saved and submitted', async () => {
    const { page } = b;
    const ravi = user('ravi');
    await signIn(page, ravi.email, ravi.password);
    await goTo(page, 'Suites');
    await page.getByTestId('suite-sqrt-principal-sz').waitFor();
    await saveScreenshots(page, 'suites-list', () => page.getByTestId('suite-sqrt-principal-sz').waitFor());

    await page.getByRole('link', { name: 'New suite' }).click();
    await fill(page, 'Id', SLUG);
    await fill(page, 'Title', 'Cube root of z(z−1) as cbrt z · cbrt(z−1): one cut (−∞, 1]');
    await fill(
      page,
      'Story',
      'Mei’s users take cube roots of products. The product of principal cube roots is the branch of (z(z−1))^(1/3) that equals the real cube root of 2 at z = 2 with a single cut from 1 through 0 to −∞.',
    );
    await fill(page, 'Subject', 'cbrt(z) * cbrt(z - 1)');
    await page.getByRole('radio', { name: 'Branch spec: regular branch of g(z)^ν' }).click();
    await fill(page, 'g(z)', 'z*(z - 1)');
    await fill(page, 'ν', '1/3');
    await page.getByRole('button', { name: '+ Add a cut' }).click();
    // First attempt: the finite cut [0, 1] alone; a loop around it has monodromy e^{2πi·2/3}.
    await fill(page, 'Cut 1 point 1, real part', '1');
    await fill(page, 'Cut 1 point 2, real part', '0');
    await page.getByRole('checkbox', { name: 'Cut 1 continues to infinity' }).click();
    await fill(page, 'Path 1 center, real part', '0.5');
    await page.getByRole('button', { name: 'Save draft' }).click();
    const layoutRule = page.getByTestId('cut-layout-rules');
    await layoutRule.waitFor();
    expect(await layoutRule.textContent()).toMatch(
      /a loop around the cut through \(1, 0\), \(0, 0\) crosses no cut, yet going once around it multiplies the value by e2πi·2\/3, not 1/,
    );
    await page.getByTestId('suite-form-refused').waitFor();
    expect(await page.evaluate((slug) => fetch(`/api/suites/${slug}`).then((r) => r.status), SLUG)).toBe(404);

    // The fix: the cut continues from 0 to infinity, so no cut-free loop encloses a branch point alone.
    await page.getByRole('checkbox', { name: 'Cut 1 continues to infinity' }).click();
    await layoutRule.waitFor({ state: 'detached' });
    expect(await page.getByLabel('Title', { exact: true }).inputValue()).toBe(
      'Cube root of z(z−1) as cbrt z · cbrt(z−1): one cut (−∞, 1]',
    );
    await page
      .getByTestId('suite-preview-summary')
      .getByText(/2 branch points/)
      .waitFor();

    // A reload loses nothing: the browser kept the unsaved work and offers it back.
    await page.waitForFunction(() =>
      Object.keys(window.localStorage).some(
        (k) =>
          k.startsWith('sheetkeeper.suite-draft.') &&
          k.endsWith('.new') &&
          window.localStorage.getItem(k)!.includes('one cut (−∞, 1]'),
      ),
    );
    await page.reload();
    await page.getByTestId('kept-draft-notice').waitFor();
    expect(await page.getByLabel('Title', { exact: true }).inputValue()).toBe('');
    await page.getByRole('button', { name: 'Restore it' }).click();
    expect(await page.getByLabel('Title', { exact: true }).inputValue()).toBe(
      'Cube root of z(z−1) as cbrt z · cbrt(z−1): one cut (−∞, 1]',
    );
    expect(await page.getByRole('checkbox', { name: 'Cut 1 continues to infinity' }).isChecked()).toBe(true);
    await page
      .getByTestId('suite-preview-summary')
      .getByText(/2 branch points/)
      .waitFor();
    await saveScreenshots(page, 'suite-form', async () => {
      await page
        .getByTestId('suite-preview-summary')
        .getByText(/2 branch points/)
        .waitFor();
      await page.getByTestId('suite-preview').scrollIntoViewIfNeeded();
    });

    await page.getByRole('button', { name: 'Save and submit for review' }).click();
    await page.getByLabel('version 1 submitted').first().waitFor();
    expect(new URL(page.url()).pathname).toBe(`/suites/${SLUG}`);
    await page.getByTestId('suite-picture-summary').waitFor();
    await saveScreenshots(page, 'suite-detail', () => page.getByTestId('suite-picture-summary').waitFor());
    await phoneLayout(page);
    await signOut(page);
  });

  it('hanne sees it in the Review queue as a first version and approves it', async () => {
    const { page } = b;
    const hanne = user('hanne');
    await signIn(page, hanne.email, hanne.password);
    await goTo(page, 'Review');
    await page.getByTestId(`suite-${SLUG}`).waitFor();
    await saveScreenshots(page, 'review-queue', () => page.getByTestId(`suite-${SLUG}`).waitFor());
    await phoneLayout(page);
    await page.getByTestId(`suite-${SLUG}`).click();
    await page
      .getByTestId('suite-diff')
      .getByText(/first version/)
      .waitFor();
    await page.getByLabel('Comment', { exact: true }).fill('Layout checked: both branch points on the one cut.');
    await page.getByRole('radio', { name: 'Decision: approve' }).click();
    await page.getByRole('button', { name: 'Approve version 1' }).click();
    await page
      .getByText('Nothing waits for review.')
      .or(page.getByRole('heading', { name: 'Review', exact: true }))
      .first()
      .waitFor();
    await signOut(page);
  });

  it('ravi widens the circle in version 2; hanne sees the diff against version 1 and approves', async () => {
    const { page } = b;
    const ravi = user('ravi');
    await signIn(page, ravi.email, ravi.password);
    await page.goto(new URL(`/suites/${SLUG}`, page.url()).href);
    await page.getByRole('link', { name: 'Edit as version 2' }).click();
    await fill(page, 'Path 1 radius', '3');
    await page.getByRole('button', { name: 'Save and submit for review' }).click();
    await page.getByLabel('version 2 submitted').first().waitFor();
    await signOut(page);

    const hanne = user('hanne');
    await signIn(page, hanne.email, hanne.password);
    await goTo(page, 'Review');
    await page.getByTestId(`suite-${SLUG}`).click();
    const diff = page.getByTestId('suite-diff');
    await diff.getByText('Against version 1 (approved): 1 changed, 0 added, 0 removed.').waitFor();
    await diff.getByLabel('paths.0.radius changed').waitFor();
    expect(await diff.getByLabel('was 2').count()).toBe(1);
    expect(await diff.getByLabel('now 3').count()).toBe(1);
    await saveScreenshots(page, 'suite-review', () => diff.getByLabel('paths.0.radius changed').waitFor());
    await page.getByRole('radio', { name: 'Decision: approve' }).click();
    await page.getByRole('button', { name: 'Approve version 2' }).click();
    await page.getByRole('heading', { name: 'Review', exact: true }).waitFor();
    const versions = await page.evaluate((slug) => fetch(`/api/suites/${slug}`).then((r) => r.json()), SLUG);
    expect(versions.versions.map((v: { version: number; status: string }) => [v.version, v.status])).toEqual([
      [2, 'approved'],
      [1, 'approved'],
    ]);
  });
});
