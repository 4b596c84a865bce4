import { readFileSync } from 'node:fs';
import type { AxeResults } from 'axe-core';
import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { BASE_URL } from './support/open-browser';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { pageApi } from './support/page-api';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';

const b = browserPerTest();
const kwame = DEMO_USERS.find((u) => u.email === 'kwame@sheetkeeper.test')!;

/**
 * axe-core's violations of any impact inside the page's math elements and pictures (evaluated
 * through the DevTools protocol: the Content-Security-Policy refuses an inline script).
 * day-access.test.ts checks whole screens; this names the formulas' own faults, an ARIA attribute
 * a math element or a chart's text may not carry among them.
 */
async function formulaViolations(page: Page): Promise<string[]> {
  await page.evaluate(readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8'));
  return page.evaluate(async () => {
    const { axe } = window as unknown as { axe: { run: (context: object, options: object) => Promise<AxeResults> } };
    const results = await axe.run({ include: [['[role="math"]'], ['[role="img"]']] }, { resultTypes: ['violations'] });
    return results.violations.map((v) => `${v.id} (${v.impact}): ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`);
  });
}

/** Chromium's own accessibility tree (DevTools' Accessibility domain): the names of its math nodes, and every name read. */
async function chromiumTree(page: Page): Promise<{ math: string[]; read: string[] }> {
  const cdp = await page.context().newCDPSession(page);
  const { nodes } = await cdp.send('Accessibility.getFullAXTree');
  await cdp.detach();
  const shown = nodes.filter((n) => !n.ignored);
  const name = (n: (typeof nodes)[number]) => String(n.name?.value ?? '');
  return { math: shown.filter((n) => n.role?.value === 'math').map(name), read: shown.map(name) };
}

describe('formulas as a screen reader hears them, in Chromium’s accessibility tree', () => {
  it('names a case’s rule and a suite’s branch, subject and story by their spoken forms, never the flat text of raised pieces', async () => {
    const { page } = b;
    await signIn(page, kwame.email, kwame.password);
    await goTo(page, 'Failures');
    await page.getByText(/failures? shown/).waitFor({ timeout: 20_000 });

    // A regular-branch case: the rule is one math element, named in words.
    const regular = await pageApi(page)<{ body: { failures: { id: string }[] } }>(
      '/failures?suite=sqrt-z2-minus-1-naive-formula&limit=1',
    );
    await page.goto(`${BASE_URL}/failures/${regular.body.failures[0]!.id}`);
    const rule = page.getByTestId('case-rule');
    await rule.getByRole('math').waitFor({ timeout: 30_000 });
    const ruleTree = await rule.ariaSnapshot();
    expect(ruleTree).toMatch(
      /- math "the regular branch of open bracket z squared minus 1 close bracket to the power one half with k equals 0 at z sub 0 equals [^"]*, continued from z sub 0 to z along a path that crosses none of the suite's cuts/,
    );
    // Nothing of the set pieces is read beside the name.
    expect(ruleTree).not.toMatch(/z2|1\/2|\^/);
    expect(await formulaViolations(page)).toEqual([]);

    // A suite page: branch, subject and story.
    await page.goto(`${BASE_URL}/suites/sqrt-z2-minus-1-finite-cut`);
    const branch = page.getByRole('math', {
      name: 'regular branch of open bracket z squared minus 1 close bracket to the power one half',
      exact: true,
    });
    await branch.waitFor({ timeout: 30_000 });
    await page
      .getByRole('math', {
        name: 'the square root of open bracket z minus 1 close bracket times the square root of open bracket z plus 1 close bracket',
        exact: true,
      })
      .waitFor();
    await page
      .getByRole('math', {
        name: /the square root of open bracket z squared minus 1 close bracket approximately equals z/,
      })
      .waitFor();
    const pageTree = await page.locator('body').ariaSnapshot();
    expect(pageTree).not.toMatch(/\(z2 − 1\)1\/2|e2πiνk/);
    const chromium = await chromiumTree(page);
    expect(chromium.math).toContain(
      'regular branch of open bracket z squared minus 1 close bracket to the power one half',
    );
    expect(chromium.read.filter((n) => /\(z2 − 1\)1\/2|e2πiνk/.test(n))).toEqual([]);
    // The plane picture says its scale with words for its signs.
    const picture = await page.getByRole('img', { name: /^Plane picture of / }).getAttribute('aria-label');
    expect(picture).toMatch(/Press plus or minus to zoom/);
    expect(picture).not.toMatch(/−/);
    expect(await formulaViolations(page)).toEqual([]);

    await saveScreenshots(page, 'suite-formula-speech', () => branch.waitFor());
  });
});
