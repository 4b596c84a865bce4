import { DEMO_USERS } from '../../server/seed/demo-users';
import { ROLES } from '../../shared/roles';
import { BASE_URL } from './support/open-browser';
import { saveScreenshots } from './support/save-screenshots';
import { signIn } from './support/sign-in';
import { signOut } from './support/sign-out';
import { browserPerTest } from './support/browser-per-test';
import { goTo } from './support/go-to';

const b = browserPerTest();

const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;

describe('signing in and out', () => {
  it('sends a signed-out visitor to the sign-in screen', async () => {
    await b.page.goto(`${BASE_URL}/users`);
    await b.page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(new URL(b.page.url()).pathname).toBe('/sign-in');
    await saveScreenshots(b.page, 'sign-in', () => b.page.getByRole('button', { name: 'Sign in' }).waitFor());
  });

  it('shows the inline rules and then the wrong-password message', async () => {
    await b.page.goto(`${BASE_URL}/sign-in`);
    await b.page.getByRole('button', { name: 'Sign in' }).click();
    await b.page.getByText('× E-mail is required').waitFor();
    await b.page.getByLabel('E-mail').fill('ravi@sheetkeeper.test');
    await b.page.getByLabel('Password').fill('not-the-password');
    await b.page.getByRole('button', { name: 'Sign in' }).click();
    await b.page.getByText('× That e-mail and password do not match an account.').waitFor();
    expect(await b.page.getByLabel('E-mail').inputValue()).toBe('ravi@sheetkeeper.test');
    await saveScreenshots(b.page, 'sign-in-wrong-password', () =>
      b.page.getByText('× That e-mail and password').waitFor(),
    );
  });

  it.each(ROLES)('signs in as %s, shows who and which role, and signs out', async (role) => {
    const user = demo(role);
    await signIn(b.page, user.email, user.password);
    expect(await b.page.getByTestId('home-email').textContent()).toBe(user.email);
    await b.page.getByLabel(`role ${role}`).first().waitFor();
    await saveScreenshots(b.page, `home-${role}`, () => b.page.getByTestId('home-email').waitFor());
    // Only admins see Users in the navigation (under "More" on a phone).
    await b.page.getByRole('link', { name: 'More', exact: true }).click();
    await b.page.getByRole('button', { name: 'Sign out' }).waitFor();
    expect(await b.page.getByRole('link', { name: 'Users', exact: true }).count()).toBe(role === 'admin' ? 1 : 0);
    // The phone's More screen (on a wide screen the rail shows the same destinations).
    if (role === 'admin')
      await saveScreenshots(b.page, 'more', () =>
        b.page.getByRole('link', { name: 'Outbox', exact: true }).first().waitFor(),
      );
    await signOut(b.page);
    expect(await b.page.evaluate(() => fetch('/api/me').then((r) => r.status))).toBe(401);
  });

  it('shows a not-found screen for an unknown address', async () => {
    await b.page.goto(`${BASE_URL}/no/such/screen`);
    await b.page.getByText('No page here').waitFor();
    await saveScreenshots(b.page, 'not-found', () => b.page.getByText('No page here').waitFor());
  });
});

describe('roles', () => {
  it('keeps Users from a contributor: no link, a refusal on the screen, and 403 from the API', async () => {
    const ravi = demo('contributor');
    await signIn(b.page, ravi.email, ravi.password);
    await b.page.getByRole('link', { name: 'More', exact: true }).click();
    await b.page.getByRole('button', { name: 'Sign out' }).waitFor();
    expect(await b.page.getByRole('link', { name: 'Users', exact: true }).count()).toBe(0);
    await b.page.goto(`${BASE_URL}/users`);
    await b.page.getByText('Only admins can see users.').waitFor();
    expect(await b.page.evaluate(() => fetch('/api/users').then((r) => r.status))).toBe(403);
  });

  it("lets an admin change a contributor's role, which shows when that user signs in again", async () => {
    const odile = demo('admin');
    await signIn(b.page, odile.email, odile.password);
    await goTo(b.page, 'Users');
    const mei = b.page.getByTestId('user-mei@sheetkeeper.test');
    await mei.waitFor();
    await saveScreenshots(b.page, 'users', () => mei.waitFor());
    // A role changes only after its confirmation (docs/admin.md), then the row says "saved".
    await mei.getByRole('radio', { name: 'Role: reviewer' }).click();
    await mei.getByText('Make Mei Okonkwo a reviewer?').waitFor();
    const [patch] = await Promise.all([
      b.page.waitForResponse((r) => r.url().includes('/api/users/') && r.request().method() === 'PATCH'),
      mei.getByRole('button', { name: 'Yes, make a reviewer' }).click(),
    ]);
    expect(patch.status()).toBe(200);
    await b.page.getByTestId('saved-mei@sheetkeeper.test').getByText('saved: a reviewer').waitFor();
    await mei.getByRole('radio', { name: 'Role: reviewer', checked: true }).waitFor();
    await signOut(b.page);

    await signIn(b.page, 'mei@sheetkeeper.test', 'mei-demo-2026');
    await b.page.getByLabel('role reviewer').waitFor();
    expect(await b.page.getByLabel('role contributor').count()).toBe(0);
  });
});
