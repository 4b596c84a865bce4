import { readFileSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import type { AxeResults } from 'axe-core';
import nodemailer from 'nodemailer';
import type { Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import type { Role } from '../../shared/roles';
import { browserPerTest } from './support/browser-per-test';
import { BASE_URL } from './support/open-browser';
import { SCREEN_SIZES, saveScreenshots } from './support/save-screenshots';
import { SCREENS_BY_ROUTE, type ApiReader, type ScreenVisit } from './support/screens-by-route';
import { signIn } from './support/sign-in';

/**
 * Point 11 of the day-long review, checked by a well-known checker: axe-core (Deque's rules for
 * WCAG 2.x A and AA, contrast included) over every screen of the app, at the phone and the wide
 * size, as the role that meets it; 0 serious and 0 critical violations. Each screen also names its
 * browser tab. The screens come from the route files in app/ (tests/e2e/support/screens-by-route.ts
 * says how to reach each), so a new route file fails the coverage test until it is listed there.
 * Then the keyboard: one Tab stop per control and per radio group, arrow keys inside a group.
 */
const APP = path.join(__dirname, '..', '..', 'app');
// Evaluated rather than added as a <script>: the server's Content-Security-Policy (script-src 'self')
// refuses inline scripts, and page.evaluate goes through the DevTools protocol, which it does not govern.
const AXE = readFileSync(require.resolve('axe-core/axe.min.js'), 'utf8');
const b = browserPerTest();
const checked = new Set<string>();

/** The route files under app/, as paths from app/ without the extension; layouts are frames, not screens. */
function routeFiles(dir = APP): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeFiles(full);
    if (!/\.tsx?$/.test(name) || name.startsWith('_layout.')) return [];
    return [
      path
        .relative(APP, full)
        .replace(/\.tsx?$/, '')
        .split(path.sep)
        .join('/'),
    ];
  });
}

const api =
  (page: Page): ApiReader =>
  (p) =>
    page.evaluate(async (url) => {
      const res = await fetch(url);
      if (!res.ok) throw new Error(`${url} answered ${res.status}`);
      return res.json();
    }, `/api${p}`);

/** Waits for the screen's title and for its data (no "Loading…" left), then two frames. */
async function settle(page: Page, title: RegExp): Promise<string | null> {
  const titled = await page
    .waitForFunction((source) => new RegExp(source).test(document.title), title.source, { timeout: 10_000 })
    .then(() => null)
    .catch(async () => `tab title ${JSON.stringify(await page.title())} does not match ${title}`);
  await page
    .waitForFunction(() => !document.body.innerText.includes('Loading…'), undefined, { timeout: 10_000 })
    .catch(() => undefined);
  await page.evaluate(() => new Promise((done) => requestAnimationFrame(() => requestAnimationFrame(done))));
  return titled;
}

/** axe-core's serious and critical violations on the page as it stands, one line each with the elements. */
async function seriousViolations(page: Page): Promise<string[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.evaluate(AXE);
  const violations = await page.evaluate(async () => {
    const { axe } = window as unknown as { axe: { run: (context: Document, options: object) => Promise<AxeResults> } };
    const results = await axe.run(document, { resultTypes: ['violations'] });
    return results.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({ id: v.id, impact: v.impact, help: v.help, targets: v.nodes.map((n) => n.target.join(' ')) }));
  });
  return violations.map(
    (v) =>
      `${v.id} (${v.impact}): ${v.help}\n      ${v.targets.slice(0, 6).join('\n      ')}${v.targets.length > 6 ? `\n      … ${v.targets.length - 6} more` : ''}`,
  );
}

/** Opens each route the role meets, at both sizes; returns what is wrong, one entry per screen and size. */
async function checkScreensOf(role: Role | null): Promise<string[]> {
  const user = DEMO_USERS.find((u) => u.role === role);
  if (user) await signIn(b.page, user.email, user.password);
  const problems: string[] = [];
  for (const [route, visit] of Object.entries(SCREENS_BY_ROUTE).filter(([, v]) => v.role === role)) {
    problems.push(...(await checkScreen(route, visit)));
    checked.add(route);
  }
  return problems;
}

async function checkScreen(route: string, visit: ScreenVisit): Promise<string[]> {
  const problems: string[] = [];
  await b.page.setViewportSize(SCREEN_SIZES[0]);
  await b.page.goto(`${BASE_URL}${await visit.path(api(b.page))}`);
  for (const size of SCREEN_SIZES) {
    await b.page.setViewportSize(size);
    const where = `${route} at ${size.width}×${size.height}`;
    const title = await settle(b.page, visit.title);
    if (title) problems.push(`${where}: ${title}`);
    for (const v of await seriousViolations(b.page)) problems.push(`${where}: ${v}`);
  }
  return problems;
}

describe('every screen, for the role that meets it', () => {
  it('passes axe-core with no serious or critical violation, and names its tab, signed out', async () => {
    expect(await checkScreensOf(null)).toEqual([]);
  });

  it(
    'passes for the maintainer',
    async () => {
      const problems = await checkScreensOf('maintainer');
      expect(problems).toEqual([]);
      // The screens whose chips, marks and inks changed, for the lead's eyes.
      await b.page.goto(`${BASE_URL}/failures`);
      await saveScreenshots(b.page, 'access-failures', () =>
        b.page
          .getByText(/failures? shown/)
          .first()
          .waitFor(),
      );
      await b.page.goto(`${BASE_URL}/more`);
      await saveScreenshots(b.page, 'access-more', () =>
        b.page.getByText('maintainer', { exact: true }).first().waitFor(),
      );
    },
    // Fourteen screens at two sizes: thirteen took about 35 s on the shared 2-core machine (load 8-12).
    180_000,
  );

  it('passes for the contributor', async () => {
    const problems = await checkScreensOf('contributor');
    await b.page.goto(`${BASE_URL}/suites/new`);
    await saveScreenshots(b.page, 'access-suite-new', () => b.page.getByRole('radiogroup').first().waitFor());
    expect(problems).toEqual([]);
  });

  it('passes for the reviewer', async () => {
    expect(await checkScreensOf('reviewer')).toEqual([]);
  });

  it('passes for the admin, the outbox holding one message', async () => {
    const transport = nodemailer.createTransport({
      host: '127.0.0.1',
      port: Number(process.env.SHEETKEEPER_E2E_SMTP_PORT),
      secure: false,
      ignoreTLS: true,
    });
    await transport.sendMail({
      from: 'Sheetkeeper <sheetkeeper@localhost>',
      to: 'kwame@sheetkeeper.test',
      subject: `Contrast check ${Date.now()}`,
      text: 'A message for the outbox screens.',
    });
    transport.close();
    expect(await checkScreensOf('admin')).toEqual([]);
  });

  it('left no route file of app/ unchecked', () => {
    const routes = routeFiles();
    expect(routes.filter((r) => !(r in SCREENS_BY_ROUTE))).toEqual([]);
    expect(routes.filter((r) => !checked.has(r))).toEqual([]);
  });
});

describe('the keyboard, on the failure table with its filters', () => {
  /** Presses Tab from the top of the page until focus wraps, naming each element it stops on. */
  async function tabStops(page: Page): Promise<string[]> {
    const stops: string[] = [];
    for (let i = 0; i < 300; i += 1) {
      await page.keyboard.press('Tab');
      const stop = await page.evaluate(() => {
        const el = document.activeElement as HTMLElement | null;
        if (!el || el === document.body) return null;
        el.dataset.tabStop ??= String(document.querySelectorAll('[data-tab-stop]').length + 1);
        return `${el.dataset.tabStop} ${el.getAttribute('aria-label') ?? el.textContent?.trim().slice(0, 40)}`;
      });
      if (stop === null || stops.includes(stop)) break;
      stops.push(stop);
    }
    return stops;
  }

  it('reaches every control once, stops once in each radio group, and moves the choice with the arrow keys', async () => {
    const kwame = DEMO_USERS.find((u) => u.role === 'maintainer')!;
    await signIn(b.page, kwame.email, kwame.password);
    await b.page.setViewportSize(SCREEN_SIZES[1]);
    await b.page.goto(`${BASE_URL}/failures`);
    const diagnosis = b.page.getByRole('radiogroup', { name: 'Diagnosis' });
    await diagnosis.waitFor();
    await settle(b.page, /^Failures · Sheetkeeper$/);

    const stops = await tabStops(b.page);
    const { unreached, groupsStops } = await b.page.evaluate(() => {
      const visible = (el: Element) => el.getClientRects().length > 0 && getComputedStyle(el).visibility !== 'hidden';
      const tabbable = Array.from(
        document.querySelectorAll<HTMLElement>('a[href], button, input, select, textarea, [tabindex]'),
      ).filter((el) => el.tabIndex >= 0 && !el.hasAttribute('disabled') && visible(el));
      return {
        unreached: tabbable
          .filter((el) => !el.dataset.tabStop)
          .map((el) => el.getAttribute('aria-label') ?? el.outerHTML.slice(0, 80)),
        groupsStops: Array.from(document.querySelectorAll('[role="radiogroup"]')).map(
          (g) => `${g.getAttribute('aria-label')}: ${g.querySelectorAll('[role="radio"][tabindex="0"]').length}`,
        ),
      };
    });
    expect(unreached).toEqual([]);
    expect(groupsStops).toEqual(groupsStops.map((g) => g.replace(/\d+$/, '1')));
    const toDiagnosis = stops.findIndex((s) => / Diagnosis: /.test(s)) + 1;
    console.log(
      `[access] ${stops.length} tab stops on the failure table; the Diagnosis group is Tab number ${toDiagnosis}`,
    );
    expect(stops.filter((s) => / Diagnosis: /.test(s))).toHaveLength(1);

    // Choosing a filter opens the table at a new address (so Back undoes it), and the screen mounts
    // again: the focus follows the choice onto the new screen, so the arrow keys go on moving
    // through the group instead of dropping the focus to the page after one step.
    const radios = diagnosis.getByRole('radio');
    const names = await radios.evaluateAll((all) => all.map((r) => r.getAttribute('aria-label')));
    await radios.first().focus();
    expect(await radios.first().getAttribute('aria-checked')).toBe('true');
    const focusedChoice = () =>
      b.page.evaluate(() => {
        const el = document.activeElement;
        return el?.getAttribute('role') === 'radio' && el.getAttribute('aria-checked') === 'true'
          ? el.getAttribute('aria-label')
          : (el?.getAttribute('aria-label') ?? el?.tagName ?? null);
      });
    const chosen: (string | null)[] = [];
    for (const step of [1, 2]) {
      await b.page.keyboard.press('ArrowRight');
      await b.page
        .waitForFunction(
          (name) =>
            new URLSearchParams(location.search).has('diagnosis') &&
            document.activeElement?.getAttribute('aria-label') === name,
          names[step],
          { timeout: 10_000 },
        )
        .catch(() => undefined);
      expect(await focusedChoice()).toBe(names[step]);
      chosen.push(new URL(b.page.url()).searchParams.get('diagnosis'));
    }
    // Each step chose a diagnosis of its own: the second arrow moved on from the first's choice.
    expect(new Set(chosen.filter(Boolean)).size).toBe(2);
    // Typing a filter and pressing Enter keeps the focus in that field on the new screen.
    const suite = b.page.getByLabel('Suite', { exact: true });
    await suite.fill('sqrt-principal-sz');
    await suite.press('Enter');
    await b.page.waitForURL(/suite=sqrt-principal-sz/);
    await b.page
      .waitForFunction(() => document.activeElement?.getAttribute('aria-label') === 'Suite', undefined, {
        timeout: 10_000,
      })
      .catch(() => undefined);
    expect(await focusedChoice()).toBe('Suite');
  });
});

describe('the keyboard, in a form', () => {
  it('moves the choice and the focus together with the arrow keys, Home and End, and wraps at the ends', async () => {
    const ravi = DEMO_USERS.find((u) => u.role === 'contributor')!;
    await signIn(b.page, ravi.email, ravi.password);
    await b.page.setViewportSize(SCREEN_SIZES[1]);
    await b.page.goto(`${BASE_URL}/suites/new`);
    const group = b.page.getByRole('radiogroup', { name: 'Convention on the cuts' });
    await group.waitFor();
    const radios = group.getByRole('radio');
    const checkedIndex = () =>
      radios.evaluateAll((all) => all.findIndex((r) => r.getAttribute('aria-checked') === 'true'));
    const focusedIndex = () => radios.evaluateAll((all) => all.findIndex((r) => r === document.activeElement));
    expect(
      await radios.evaluateAll((all) => all.map((r) => r.getAttribute('tabindex')).filter((t) => t === '0')),
    ).toEqual(['0']);
    const start = Math.max(0, await checkedIndex());
    const count = await radios.count();
    await radios.nth(start).focus();
    await b.page.keyboard.press('ArrowRight');
    expect([await checkedIndex(), await focusedIndex()]).toEqual([(start + 1) % count, (start + 1) % count]);
    await b.page.keyboard.press('End');
    expect([await checkedIndex(), await focusedIndex()]).toEqual([count - 1, count - 1]);
    await b.page.keyboard.press('ArrowDown');
    expect([await checkedIndex(), await focusedIndex()]).toEqual([0, 0]);
    await b.page.keyboard.press('Home');
    await b.page.keyboard.press('ArrowLeft');
    expect([await checkedIndex(), await focusedIndex()]).toEqual([count - 1, count - 1]);
    // Tab leaves the group from its one stop instead of walking through every chip.
    await b.page.keyboard.press('Tab');
    expect(await focusedIndex()).toBe(-1);
  });
});
