import { DEMO_USERS } from '../../server/seed/demo-users';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();

const ravi = DEMO_USERS.find((u) => u.email === 'ravi@sheetkeeper.test')!;
const odile = DEMO_USERS.find((u) => u.role === 'admin')!;

describe('Libraries', () => {
  it("opens a library's fingerprint with its evidence, then the cut maps of two functions", async () => {
    await signIn(b.page, ravi.email, ravi.password);
    await goTo(b.page, 'Libraries');
    const complexJs = b.page.getByTestId('library-complex.js');
    await complexJs.waitFor();
    // complex.js 2.0.11 … 2.4.3 are installed side by side under npm aliases.
    for (const version of ['2.0.11', '2.4.3']) await complexJs.getByText(version, { exact: true }).waitFor();
    await b.page
      .getByTestId('library-cmath')
      .getByText('One installed version: nothing to compare across versions.')
      .waitFor();
    await saveScreenshots(b.page, 'libraries', () => complexJs.waitFor());

    await complexJs.getByRole('link', { name: /^2\.4\.3 / }).click();
    const sqrt = b.page.getByTestId('fingerprint-sqrt-(-inf, 0]');
    await sqrt.waitFor({ timeout: 30_000 });
    // Its √ closes the cut counter-clockwise while log and the powers follow the zero sign.
    await sqrt
      .getByText('On its own ↺ counter-clockwise; disagrees with pow(z, 1/2), log, pow(z, 1/3) on the same cut')
      .waitFor();
    await sqrt.getByText('counter-clockwise at 4 of 4 places').waitFor();
    await b.page
      .getByTestId('fingerprint-scope')
      .getByText(/Not checked: the rest of each cut/)
      .waitFor();
    await b.page.getByRole('button', { name: 'Show 4 places probed for sqrt on (-inf, 0]' }).click();
    await b.page.getByLabel('Places probed for sqrt on (-inf, 0]').getByText('z = −0.5 ± 0i').waitFor();
    await saveScreenshots(b.page, 'library-fingerprint', () => sqrt.waitFor());

    await b.page.getByRole('link', { name: 'Cut map of sqrt' }).first().click();
    const verdict = b.page.getByTestId('cut-map-verdict');
    await verdict.getByText(/✓ Matches/).waitFor({ timeout: 30_000 });
    await b.page.getByText(/a jump on 100 % of the grid lines crossing it — seen/).waitFor();
    await saveScreenshots(b.page, 'library-cut-map', () => verdict.waitFor());

    // The server's bound, checked first by the same schema in the form: nothing is sent, the grid typed stays.
    await b.page.getByLabel('Grid (columns x rows, up to 201x201)').fill('401x401');
    await b.page.getByRole('button', { name: 'Map this box' }).click();
    await b.page.getByText('allows at most 201 columns and rows on the server', { exact: false }).waitFor();
    expect(await b.page.getByLabel('Grid (columns x rows, up to 201x201)').inputValue()).toBe('401x401');

    await b.page.getByLabel('Grid (columns x rows, up to 201x201)').fill('81x81');
    await b.page.getByLabel('Box (re0,im0,re1,im1)').fill('-2,-2,2,2');
    await b.page.getByRole('radio', { name: 'Map acot', exact: true }).click();
    await b.page.getByRole('button', { name: 'Map this box' }).click();
    await verdict
      .getByText(/≠ Differs: \d+ stretch\(es\) of discontinuity off the expected cuts/)
      .waitFor({ timeout: 30_000 });
    expect(new URL(b.page.url()).searchParams.get('fn')).toBe('acot');
    await saveScreenshots(b.page, 'library-cut-map-acot', () => verdict.getByText(/≠ Differs/).waitFor());
  }, 180_000);

  it('lets an admin add a program in another language as a target, which gets ready in the background, then remove it', async () => {
    await signIn(b.page, odile.email, odile.password);
    await goTo(b.page, 'Libraries');
    const form = b.page.getByTestId('target-source-form');
    await form.getByRole('radio', { name: /Program/ }).click();
    // An empty command is refused beside its field, by the same schema the server uses.
    await b.page.getByTestId('target-source-command').fill(' ');
    await form.getByText('must name the program to run', { exact: false }).waitFor();
    // Python's cmath adapter under a name of its own (the built-in cmath target has the one it describes).
    await b.page.getByTestId('target-source-command').fill('/usr/bin/python3 harness/adapters/python/cmath_adapter.py');
    await b.page.getByTestId('target-source-name').fill('cmath-e2e@1');
    await form.getByRole('button', { name: 'Add target' }).click();
    const list = b.page.getByTestId('target-source-list');
    await list.getByText('Ready to plan: cmath-e2e@1').waitFor({ timeout: 30_000 });
    await saveScreenshots(b.page, 'libraries-added-target', () => list.getByText('cmath-e2e@1').first().waitFor());
    await list.getByRole('button', { name: 'Remove cmath-e2e@1' }).click();
    await b.page.getByRole('button', { name: 'Yes, remove' }).click();
    await list.getByText('cmath-e2e@1').first().waitFor({ state: 'detached' });
  }, 90_000);

  it('opens the version matrix of complex.js and a changed point', async () => {
    await signIn(b.page, ravi.email, ravi.password);
    await b.page.goto(`${BASE_URL}/libraries`);
    await b.page.getByRole('link', { name: 'Version matrix of complex.js' }).click();
    // The first visit runs all approved demo suites on seven versions (~6 s of server time), in groups.
    await b.page.getByText(/All \d+ approved suites compared\./).waitFor({ timeout: 150_000 });
    const summary = b.page.getByTestId('matrix-summary');
    expect(await summary.textContent()).toMatch(
      /suites over 7 versions of complex\.js: [\d,]+ points? in \d+ suites? changed value somewhere\./,
    );
    const sqrt = b.page.getByTestId('matrix-sqrt-principal-sz');
    await sqrt
      .getByText(/∆ \d+ changed/)
      .first()
      .waitFor();
    await sqrt.getByRole('button', { name: /^Show \d+ changed points? of sqrt-principal-sz$/ }).click();
    await sqrt
      .getByText(/first changed in 2\.\d+\.\d+/)
      .first()
      .waitFor();
    await saveScreenshots(b.page, 'library-version-matrix', () => summary.waitFor());

    // On a wide screen the version headings stay in view while the suites scroll under them.
    await b.page.setViewportSize({ width: 1440, height: 900 });
    const heading = b.page.getByText('2.0.11', { exact: true }).first();
    await heading.waitFor();
    await b.page.locator('[data-testid^="matrix-"]').last().scrollIntoViewIfNeeded();
    const box = (await heading.boundingBox())!;
    expect(box.y).toBeGreaterThanOrEqual(0);
    expect(box.y + box.height).toBeLessThanOrEqual(900);
    expect(
      await b.page.evaluate(
        () =>
          document.scrollingElement!.scrollTop +
          Math.max(...Array.from(document.querySelectorAll('div')).map((d) => d.scrollTop)),
      ),
    ).toBeGreaterThan(900);
  }, 240_000);
});
