import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();
const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;

interface Row {
  id: string;
  suiteSlug: string;
  pathName: string;
  z: { re: string; im: string };
}

/** The API as the signed-in page sees it (plain promise chains: the page has no babel helpers). */
const api = <T>(path: string): Promise<T> =>
  b.page.evaluate((p) => fetch('/api' + p).then((res) => res.json()), path) as Promise<T>;
const textOf = async (page: Page, testID: string) => (await page.getByTestId(testID).textContent()) ?? '';
const fill = (page: Page, label: string, value: string) => page.getByLabel(label, { exact: true }).fill(value);

/** The plane's own drawing and where, in it, the branch point's ring and every word sit. */
async function planeFacts(page: Page, testID: string) {
  return page.getByTestId(testID).evaluate((frame) => {
    const svg = frame.querySelector('svg')!;
    const width = Number(svg.getAttribute('width'));
    const ring = Array.from(svg.querySelectorAll('circle')).find((c) => c.getAttribute('r') === '6');
    return {
      width,
      ringX: ring ? Number(ring.getAttribute('cx')) : null,
      words: Array.from(svg.querySelectorAll('text')).map((t) => t.textContent),
      fonts: [...new Set(Array.from(svg.querySelectorAll('text')).map((t) => getComputedStyle(t).fontFamily))],
    };
  });
}

describe('the plane picture and the words of a case, as a maintainer', () => {
  it('shows a straddle on the sqrt cut on a log scale from the cut with the branch point in view, zooms, and reads a regular-branch case as maths', async () => {
    const { page } = b;
    await signIn(page, kwame.email, kwame.password);
    await goTo(page, 'Failures');
    await page.getByText(/failures? shown/).waitFor({ timeout: 20_000 });

    const { failures } = await api<{ failures: Row[] }>('/failures?suite=sqrt-principal-sz&limit=200');
    const straddle = failures.filter((f) => f.pathName === 'straddle cut 1');
    const at = straddle.find((f) => Number(f.z.re) === -0.5) ?? straddle[0]!;
    expect(at).toBeTruthy();
    await page.goto(`${BASE_URL}/failures/${at.id}`);
    await page.getByTestId('case-plane-scale').waitFor({ timeout: 30_000 });
    await page.getByTestId('case-plane').locator('svg').first().waitFor();

    // Offsets 1e-3 … 5e-324 beside a branch point 0.5 away: distance from the cut, on a log scale, said in words.
    const where = Number(at.z.re) === -0.5 ? '−0\\.5' : '[^ ]+';
    expect(await textOf(page, 'case-plane-scale')).toMatch(
      new RegExp(`^distance from ${where} on the cut, log scale \\(rings at [^)]+\\); directions from it are true$`),
    );
    const straddleFacts = await planeFacts(page, 'case-plane');
    expect(straddleFacts.words).toContain('distance from the cut, log scale');
    expect(straddleFacts.ringX).not.toBeNull();
    expect(straddleFacts.ringX!).toBeGreaterThan(0);
    expect(straddleFacts.ringX!).toBeLessThan(straddleFacts.width);
    // Chart words in the app's font, not the browser's serif.
    for (const font of straddleFacts.fonts) expect(font).toMatch(/IBMPlexSans/);

    // Zoom with the buttons and the keys, and back.
    expect(await textOf(page, 'case-plane-zoom')).toBe('zoom 1×');
    await page.getByRole('button', { name: 'Zoom in on the picture' }).click();
    expect(await textOf(page, 'case-plane-zoom')).toBe('zoom 2×');
    const image = page.getByRole('img', { name: /The complex plane with the path/ });
    await image.focus();
    await page.keyboard.press('+');
    expect(await textOf(page, 'case-plane-zoom')).toBe('zoom 4×');
    await saveScreenshots(page, 'case-straddle-zoomed', () => page.getByTestId('case-plane-scale').waitFor());
    await image.focus();
    await page.keyboard.press('0');
    expect(await textOf(page, 'case-plane-zoom')).toBe('zoom 1×');
    expect(await page.getByText(/points of across the cut|reference at no t/).count()).toBe(0);
    await saveScreenshots(page, 'case-straddle', () => page.getByTestId('case-plane-scale').waitFor());

    // A regular-branch case: its rule is maths, in words, citing no file.
    const regular = await api<{ failures: Row[] }>('/failures?suite=sqrt-z2-minus-1-naive-formula&limit=1');
    await page.goto(`${BASE_URL}/failures/${regular.failures[0]!.id}`);
    const rule = page.getByTestId('case-rule');
    await rule
      .getByText(/regular branch/)
      .first()
      .waitFor({ timeout: 30_000 });
    const ruleText = (await rule.textContent()) ?? '';
    expect(ruleText).toMatch(/^the regular branch of \(z2 − 1\)1\/2 with k = 0 at z0 = /);
    expect(ruleText).toContain("continued from z0 to z along a path that crosses none of the suite's cuts");
    expect(ruleText).not.toMatch(/\^|\.md|§|DESIGN/);
    const raised = await rule.evaluate((el) =>
      Array.from(el.querySelectorAll('span'))
        .filter((s) => getComputedStyle(s).verticalAlign === 'top')
        .map((s) => s.textContent),
    );
    expect(raised).toEqual(['2', '1/2']);
    await saveScreenshots(page, 'case-regular-branch', () =>
      page.getByTestId('case-plane-scale').waitFor({ timeout: 30_000 }),
    );
  });

  it('draws circles of radius 1e-3 and 1e-310 as circles and keeps a path with one far point apart, in the suite preview', async () => {
    const { page } = b;
    await signIn(page, kwame.email, kwame.password);
    await goTo(page, 'Suites');
    await page.getByRole('link', { name: 'New suite' }).click();
    await fill(page, 'Subject', 'sqrt(z)');
    await fill(page, 'Path 1 center, real part', '0');
    await fill(page, 'Path 1 center, imaginary part', '0');

    const circleWidth = async () =>
      page.getByTestId('suite-preview-plane').evaluate((frame) => {
        const line = Array.from(frame.querySelectorAll('svg polyline')).find(
          (p) => p.getAttribute('stroke-width') === '1.5',
        );
        const xs = (line?.getAttribute('points') ?? '').split(' ').map((pair) => Number(pair.split(',')[0]));
        return Math.max(...xs) - Math.min(...xs);
      });
    for (const [radius, range] of [
      ['1e-3', /^Re −0\.00115 … 0\.00115, Im /],
      ['1e-310', /^Re −1\.15e−310 … 1\.15e−310, Im /],
    ] as const) {
      await fill(page, 'Path 1 radius', radius);
      await page.waitForFunction(
        ([id, pattern]) => new RegExp(pattern).test(document.querySelector(`[data-testid="${id}"]`)?.textContent ?? ''),
        ['suite-preview-plane-scale', range.source] as const,
      );
      // Drawn across most of the picture, not as a dot.
      expect(await circleWidth()).toBeGreaterThan(150);
    }
    await saveScreenshots(page, 'suite-preview-tiny-circle', () =>
      page.getByTestId('suite-preview-plane-scale').waitFor(),
    );

    await page.getByRole('radio', { name: 'Path 1 kind: points' }).click();
    await fill(page, 'Path 1 point 1, real part', '0.1');
    await fill(page, 'Path 1 point 1, imaginary part', '0.1');
    await fill(page, 'Path 1 point 2, real part', '0.2');
    await fill(page, 'Path 1 point 2, imaginary part', '0');
    await page.getByRole('button', { name: 'Add a path 1 point' }).click();
    await fill(page, 'Path 1 point 3, real part', '1e6');
    await fill(page, 'Path 1 point 3, imaginary part', '0');
    await page.waitForFunction(
      (id) =>
        /^distance from the branch point 0, log scale/.test(
          document.querySelector(`[data-testid="${id}"]`)?.textContent ?? '',
        ),
      'suite-preview-plane-scale',
    );
    // The two near points stay apart from each other: more than 6 px between them at zoom 1× (seven decades share the radius).
    const near = await page.getByTestId('suite-preview-plane').evaluate((frame) =>
      Array.from(frame.querySelector('svg')!.querySelectorAll('circle'))
        .filter((c) => c.getAttribute('r') === '2.5')
        .map((c) => [Number(c.getAttribute('cx')), Number(c.getAttribute('cy'))]),
    );
    expect(near).toHaveLength(3);
    const [p1, p2] = near as [number[], number[]];
    expect(Math.hypot(p1[0]! - p2[0]!, p1[1]! - p2[1]!)).toBeGreaterThan(6);
    await saveScreenshots(page, 'suite-preview-far-point', () =>
      page.getByTestId('suite-preview-plane-scale').waitFor(),
    );
  });
});
