import type { Locator, Page } from 'playwright-core';
import { DEMO_USERS } from '../../server/seed/demo-users';
import { roleWithArticle } from '../../shared/role-with-article';
import type { Role } from '../../shared/roles';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';
import { BASE_URL, openBrowser } from './support/open-browser';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';
import { signOut } from './support/sign-out';

/**
 * Issue 15, point 10: the admin's day. Odile invites someone, the mail reaches the local mail
 * store and the Outbox, the link makes the account once; she cancels an invitation sent with the
 * wrong role, whose link then says it was withdrawn; she changes a role with a confirmation
 * and sees "saved"; she deactivates Mei, whose open session stops at once, reactivates her and
 * mails her a reset that Mei uses. The e2e database is shared by every journey of `npm test`, so
 * this one leaves each demo account as it found it (role, active, password).
 */
const b = browserPerTest();
const demo = (email: string) => DEMO_USERS.find((u) => u.email === email)!;
const odile = demo('odile@sheetkeeper.test');
const mei = demo('mei@sheetkeeper.test');

/** The server hands queued mail to the local store every 5 s: reloads the Outbox until `name`'s row is there. */
async function openMail(page: Page, name: RegExp, screenshot = false): Promise<string> {
  await goTo(page, 'Outbox');
  const row = page.getByRole('link', { name }).first();
  for (let i = 0; i < 30 && !(await row.isVisible()); i += 1) {
    await page.waitForTimeout(500);
    await page.reload();
    await page
      .getByTestId('mail-list')
      .or(page.getByText('No mail received yet', { exact: false }))
      .waitFor();
  }
  if (screenshot) await saveScreenshots(page, 'admin-outbox', () => row.waitFor());
  await row.click();
  await page.getByRole('tab', { name: 'Plain text' }).click();
  const text = (await page.getByTestId('mail-text').textContent()) ?? '';
  const link = /http:\/\/\S+\/join\?token=skl_[A-Za-z0-9_-]{43}/.exec(text)?.[0];
  if (!link) throw new Error(`no one-time link in the mail: ${text}`);
  // The mail's links start with the server's SHEETKEEPER_APP_URL, which is the e2e server here.
  expect(new URL(link).origin).toBe(new URL(BASE_URL).origin);
  return link;
}

/** Signs Odile in and sends an invitation from the Users screen's form; answers the line that says it was mailed. */
async function inviteAsOdile(page: Page, email: string, role: Role): Promise<Locator> {
  await signIn(page, odile.email, odile.password);
  await goTo(page, 'Users');
  const form = page.getByTestId('invite-form');
  await form.getByLabel('E-mail of the person to invite').fill(email);
  await form.getByRole('radio', { name: `Role: ${role}` }).click();
  await form.getByRole('button', { name: 'Mail the invitation' }).click();
  const sent = page.getByTestId('invite-sent');
  await sent.getByText(`Invitation mailed to ${email} as ${roleWithArticle(role)}`, { exact: false }).waitFor();
  return sent;
}

/** The Outbox row of the invitation mailed to `email`. */
const invitationMail = (email: string) => new RegExp(`invites you to Sheetkeeper.*${email.replace(/\./g, '\\.')}`, 'i');

/**
 * Puts Ravi's role and Mei's account back through the API as Odile (plain fetch, no browser: the
 * file's Chromium is closed by then), so a journey that stopped half-way leaves no demo account
 * changed for the journeys after it.
 */
async function restoreDemoAccounts(): Promise<void> {
  const signedIn = await fetch(`${BASE_URL}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: odile.email, password: odile.password }),
  });
  const cookie = (signedIn.headers.get('set-cookie') ?? '').split(';')[0]!;
  const call = (method: string, path: string, body?: unknown) =>
    fetch(`${BASE_URL}/api${path}`, {
      method,
      headers: { cookie, 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  const { users } = (await (await call('GET', '/users')).json()) as { users: { id: string; email: string }[] };
  const idOf = (email: string) => users.find((u) => u.email === email)!.id;
  await call('PATCH', `/users/${idOf('ravi@sheetkeeper.test')}`, { role: 'contributor' });
  await call('POST', `/users/${idOf(mei.email)}/reactivate`);
}

afterAll(() => restoreDemoAccounts());

describe("the admin's day", () => {
  it('invites someone by mail; the link makes the account with its role once, then says it was used', async () => {
    const email = `ines-${Date.now()}@example.test`;
    const sent = await inviteAsOdile(b.page, email, 'reviewer');
    await b.page.getByTestId('open-invitations').getByText(email).waitFor();
    await saveScreenshots(b.page, 'admin-users-invited', () => sent.waitFor());

    const link = await openMail(b.page, invitationMail(email), true);
    await signOut(b.page);

    await b.page.goto(link);
    await b.page.getByText(`invites ${email} to Sheetkeeper as a reviewer`, { exact: false }).waitFor();
    await saveScreenshots(b.page, 'admin-join', () => b.page.getByLabel('Your name').waitFor());
    await b.page.getByLabel('Your name').fill('Inès Arbeloa');
    await b.page.getByLabel('New password').fill('ines-chose-this-1');
    await b.page.getByLabel('The same password again').fill('ines-chose-this-1');
    await b.page.getByRole('button', { name: 'Make my account and sign in' }).click();
    await b.page.getByTestId('home-email').getByText(email).waitFor();
    await b.page.getByLabel('role reviewer').first().waitFor();
    await signOut(b.page);

    await b.page.goto(link);
    await b.page.getByRole('heading', { name: 'This link cannot be used' }).waitFor();
    expect(await b.page.getByTestId('join-unusable').textContent()).toMatch(
      /^This invitation was used on \d{4}-\d\d-\d\d: sign in with the password chosen then, or ask Odile Marchetti/,
    );
    await saveScreenshots(b.page, 'admin-join-used', () => b.page.getByTestId('join-unusable').waitFor());
    await signIn(b.page, email, 'ines-chose-this-1');
  });

  it('cancels an invitation before it is used: the row leaves the list and the link says it was withdrawn', async () => {
    const email = `wrong-${Date.now()}@example.test`;
    await inviteAsOdile(b.page, email, 'admin');
    const link = await openMail(b.page, invitationMail(email));

    await goTo(b.page, 'Users');
    const invitation = b.page.getByTestId(`invitation-${email}`);
    await invitation.getByRole('button', { name: `Cancel invitation to ${email}` }).click();
    const question = invitation.getByText(`Cancel the invitation to ${email}? Its link stops working at once`, {
      exact: false,
    });
    await question.waitFor();
    // The question wraps inside the phone's list instead of running past its edge (it ran to ~560 px).
    const item = (await invitation.boundingBox())!;
    const asked = (await question.boundingBox())!;
    expect(asked.x + asked.width).toBeLessThanOrEqual(item.x + item.width + 1);
    await saveScreenshots(b.page, 'admin-invitation-cancel-asked', () => question.waitFor());
    await invitation.getByRole('button', { name: 'Yes, cancel it' }).click();
    const cancelled = b.page.getByTestId('invitation-cancelled');
    await cancelled.getByText(`Invitation to ${email} cancelled: its link no longer works.`).waitFor();
    await invitation.waitFor({ state: 'detached' });
    await saveScreenshots(b.page, 'admin-invitation-cancelled', () => cancelled.waitFor());
    await signOut(b.page);

    await b.page.goto(link);
    await b.page.getByRole('heading', { name: 'This link cannot be used' }).waitFor();
    expect(await b.page.getByTestId('join-unusable').textContent()).toMatch(
      /^This invitation was withdrawn on \d{4}-\d\d-\d\d: ask Odile Marchetti \(odile@sheetkeeper\.test\) for a new one\.$/,
    );
    expect(await b.page.getByLabel('Your name').count()).toBe(0);
    await saveScreenshots(b.page, 'admin-join-withdrawn', () => b.page.getByTestId('join-unusable').waitFor());
  });

  it('changes a role only after a confirmation and shows "saved" beside the row', async () => {
    await signIn(b.page, odile.email, odile.password);
    await goTo(b.page, 'Users');
    const ravi = b.page.getByTestId('user-ravi@sheetkeeper.test');
    for (const [role, article] of [
      ['maintainer', 'a maintainer'],
      ['contributor', 'a contributor'],
    ] as const) {
      await ravi.getByRole('radio', { name: `Role: ${role}` }).click();
      await ravi.getByText(`Make Ravi Dutta ${article}?`).waitFor();
      if (role === 'maintainer')
        await saveScreenshots(b.page, 'admin-role-confirm', () => ravi.getByText('Make Ravi Dutta').waitFor());
      await ravi.getByRole('button', { name: `Yes, make ${article}` }).click();
      await b.page.getByTestId('saved-ravi@sheetkeeper.test').getByText(`saved: ${article}`).waitFor();
    }
    await saveScreenshots(b.page, 'admin-role-saved', () =>
      b.page.getByTestId('saved-ravi@sheetkeeper.test').waitFor(),
    );
    // On a wide screen the ROLE column heading names the chips; no row repeats a "Role" label.
    await b.page.setViewportSize({ width: 1440, height: 900 });
    await b.page.getByText('Name and e-mail', { exact: true }).waitFor();
    await ravi.getByRole('radio', { name: 'Role: contributor' }).waitFor();
    expect(
      await b.page
        .getByTestId(/^user-/)
        .getByText('Role', { exact: true })
        .count(),
    ).toBe(0);
    await b.page.getByRole('radiogroup', { name: 'Role of Ravi Dutta' }).waitFor();
    // …and its four chips fit on one line (at flex 5 of 13 "contributor" went to a second line on every row).
    const tops = await Promise.all(
      ['admin', 'maintainer', 'reviewer', 'contributor'].map(
        async (role) => (await ravi.getByRole('radio', { name: `Role: ${role}` }).boundingBox())!.y,
      ),
    );
    expect(new Set(tops).size).toBe(1);
  });

  it('deactivates Mei, whose open session stops at once; reactivates her and mails a reset she uses', async () => {
    const other = await openBrowser();
    try {
      await signIn(other.page, mei.email, mei.password);
      await signIn(b.page, odile.email, odile.password);
      await goTo(b.page, 'Users');
      const row = b.page.getByTestId('user-mei@sheetkeeper.test');
      await row.getByRole('button', { name: 'Deactivate Mei Okonkwo' }).click();
      await row.getByRole('button', { name: 'Yes, deactivate' }).click();
      await row.getByText(/^Deactivated .*: cannot sign in$/).waitFor();
      await saveScreenshots(b.page, 'admin-deactivated', () => row.getByText(/^Deactivated/).waitFor());

      // Her open page is signed out at its next request; her password opens nothing and says why.
      await other.page.reload();
      await other.page.getByRole('button', { name: 'Sign in' }).waitFor();
      await other.page.getByLabel('E-mail').fill(mei.email);
      await other.page.getByLabel('Password').fill(mei.password);
      await other.page.getByRole('button', { name: 'Sign in' }).click();
      await other.page.getByText('× This account is deactivated, so it cannot sign in.', { exact: false }).waitFor();
      await saveScreenshots(other.page, 'admin-sign-in-deactivated', () =>
        other.page.getByText('This account is deactivated', { exact: false }).waitFor(),
      );

      await row.getByRole('button', { name: 'Reactivate Mei Okonkwo' }).click();
      await row.getByText('saved: active again').waitFor();
      await row.getByRole('button', { name: 'Mail a password reset to Mei Okonkwo' }).click();
      await row.getByRole('button', { name: 'Yes, mail the link' }).click();
      await row.getByText('Reset link mailed to mei@sheetkeeper.test', { exact: false }).waitFor();
      const link = await openMail(b.page, /^Choose a new Sheetkeeper password.*mei@sheetkeeper\.test/i);

      await other.page.goto(link);
      await other.page.getByText('Choose a new password for Mei Okonkwo', { exact: false }).waitFor();
      await saveScreenshots(other.page, 'admin-reset', () => other.page.getByLabel('New password').waitFor());
      // The demo password again: every other journey on this database signs Mei in with it.
      await other.page.getByLabel('New password').fill(mei.password);
      await other.page.getByLabel('The same password again').fill(mei.password);
      await other.page.getByRole('button', { name: 'Set the password and sign in' }).click();
      await other.page.getByTestId('home-email').getByText(mei.email).waitFor();
      await other.page.goto(link);
      await other.page.getByText(/^This password-reset link was used on/).waitFor();
    } finally {
      await other.close();
    }
  });
});
