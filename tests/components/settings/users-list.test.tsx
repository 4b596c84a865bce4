import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { UsersList } from '../../../components/settings/users-list';
import type { PublicUser } from '../../../shared/public-user';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { setScreenWidth } from '../../setup/set-screen-width';

const user = (over: Partial<PublicUser>): PublicUser => ({
  id: '00000000-0000-4000-8000-000000000001',
  email: 'odile@sheetkeeper.test',
  displayName: 'Odile Marchetti',
  role: 'admin',
  createdAt: '2026-01-01T00:00:00.000Z',
  deactivatedAt: null,
  ...over,
});
const odile = user({});
const ravi = user({
  id: '00000000-0000-4000-8000-000000000002',
  email: 'ravi@sheetkeeper.test',
  displayName: 'Ravi Dutta',
  role: 'contributor',
});
const click = (name: string | RegExp, scope: HTMLElement = document.body) =>
  act(() => fireEvent.click(within(scope).getByRole('button', { name })));
const row = (email: string) => screen.getByTestId(`user-${email}`);

describe('UsersList', () => {
  it('asks before a role change, saves only on "yes", and then shows "saved" beside the row', async () => {
    let stored = ravi;
    const calls = fakeApiRoutes({
      'GET /api/users': () => ({ status: 200, body: { users: [odile, stored] } }),
      [`PATCH /api/users/${ravi.id}`]: (body) => {
        stored = { ...ravi, role: (body as { role: PublicUser['role'] }).role };
        return { status: 200, body: { user: stored } };
      },
    });
    renderWithClient(<UsersList me={odile} />);
    await waitFor(() => screen.getByText('Ravi Dutta'));
    await act(() => fireEvent.click(within(row('ravi@sheetkeeper.test')).getByRole('radio', { name: 'Role: admin' })));
    expect(within(row('ravi@sheetkeeper.test')).getByText('Make Ravi Dutta an admin?')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'PATCH')).toEqual([]);
    await click('Keep a contributor', row('ravi@sheetkeeper.test'));
    expect(screen.queryByText('Make Ravi Dutta an admin?')).toBeNull();

    await act(() => fireEvent.click(within(row('ravi@sheetkeeper.test')).getByRole('radio', { name: 'Role: admin' })));
    await click('Yes, make an admin', row('ravi@sheetkeeper.test'));
    await waitFor(() => expect(screen.getByTestId('saved-ravi@sheetkeeper.test').textContent).toBe('saved: an admin'));
    expect(calls.filter((c) => c.method === 'PATCH').map((c) => c.body)).toEqual([{ role: 'admin' }]);
    expect(
      within(row('ravi@sheetkeeper.test')).getByRole('radio', { name: 'Role: admin' }).getAttribute('aria-checked'),
    ).toBe('true');
  });

  it("shows the server's refusal beside the row it is about and keeps the old role", async () => {
    fakeApiRoutes({
      'GET /api/users': { status: 200, body: { users: [odile, ravi] } },
      [`PATCH /api/users/${odile.id}`]: {
        status: 409,
        body: { kind: 'conflict', message: 'This is the last active admin; make someone else admin first.' },
      },
    });
    renderWithClient(<UsersList me={odile} />);
    await waitFor(() => screen.getByText('Ravi Dutta'));
    const mine = row('odile@sheetkeeper.test');
    await act(() => fireEvent.click(within(mine).getByRole('radio', { name: 'Role: maintainer' })));
    await click('Yes, make a maintainer', mine);
    await waitFor(() =>
      expect(within(mine).getByRole('alert').textContent).toBe(
        '× This is the last active admin; make someone else admin first.',
      ),
    );
    expect(within(row('ravi@sheetkeeper.test')).queryByRole('alert')).toBeNull();
    expect(within(mine).getByRole('radio', { name: 'Role: admin' }).getAttribute('aria-checked')).toBe('true');
  });

  it('deactivates only after the confirm step, then says so on the row and offers to reactivate', async () => {
    let stored = ravi;
    const calls = fakeApiRoutes({
      'GET /api/users': () => ({ status: 200, body: { users: [odile, stored] } }),
      [`POST /api/users/${ravi.id}/deactivate`]: () => {
        stored = { ...ravi, deactivatedAt: '2026-12-05T08:30:00.000Z' };
        return { status: 200, body: { user: stored } };
      },
    });
    renderWithClient(<UsersList me={odile} />);
    await waitFor(() => screen.getByText('Ravi Dutta'));
    // No one deactivates themselves: the own row has no such button.
    expect(within(row('odile@sheetkeeper.test')).queryByRole('button', { name: /Deactivate/ })).toBeNull();
    await click('Deactivate Ravi Dutta');
    expect(screen.getByText(/They are signed out at once, their API tokens stop working/)).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
    await click('Yes, deactivate');
    await waitFor(() => expect(screen.getByTestId('deactivated-ravi@sheetkeeper.test')).toBeTruthy());
    expect(screen.getByTestId('deactivated-ravi@sheetkeeper.test').textContent).toMatch(
      /^Deactivated .*: cannot sign in$/,
    );
    expect(screen.getByRole('button', { name: 'Reactivate Ravi Dutta' })).toBeTruthy();
  });

  it('mails a password reset after the confirm step and says where it went', async () => {
    const calls = fakeApiRoutes({
      'GET /api/users': { status: 200, body: { users: [odile, ravi] } },
      [`POST /api/users/${ravi.id}/password-reset`]: {
        status: 201,
        body: { reset: { email: 'ravi@sheetkeeper.test', expiresAt: '2026-12-06T08:30:00.000Z' } },
      },
    });
    renderWithClient(<UsersList me={odile} />);
    await waitFor(() => screen.getByText('Ravi Dutta'));
    await click('Mail a password reset to Ravi Dutta');
    await click('Yes, mail the link');
    await waitFor(() =>
      expect(screen.getByText(/^Reset link mailed to ravi@sheetkeeper\.test; it works until /)).toBeTruthy(),
    );
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual([
      `/api/users/${ravi.id}/password-reset`,
    ]);
  });

  it('invites with the shared schema: a bad address is named beside the field and nothing is sent; a sent one is listed as open', async () => {
    const open: unknown[] = [];
    const calls = fakeApiRoutes({
      'GET /api/users': { status: 200, body: { users: [odile] } },
      'GET /api/users/invitations': () => ({ status: 200, body: { invitations: open } }),
      'POST /api/users/invitations': (body) => {
        const invitation = { ...(body as object), expiresAt: '2026-12-12T08:00:00.000Z' };
        open.push({
          id: '00000000-0000-4000-8000-0000000000a0',
          ...invitation,
          sentBy: 'Odile Marchetti (odile@sheetkeeper.test)',
          sentAt: '2026-12-05T08:00:00.000Z',
        });
        return { status: 201, body: { invitation } };
      },
    });
    renderWithClient(<UsersList me={odile} />);
    await waitFor(() => screen.getByText('Odile Marchetti (you)'));
    await waitFor(() => screen.getByText('No invitation is waiting to be used.'));
    const email = screen.getByLabelText('E-mail of the person to invite');
    await act(() => fireEvent.change(email, { target: { value: 'not an address' } }));
    await click('Mail the invitation');
    expect(screen.getByText('× E-mail of the person to invite must be an e-mail address')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);

    await act(() => fireEvent.change(email, { target: { value: ' Ines@Example.test ' } }));
    await act(() =>
      fireEvent.click(within(screen.getByTestId('invite-form')).getByRole('radio', { name: 'Role: reviewer' })),
    );
    await click('Mail the invitation');
    await waitFor(() => expect(screen.getByTestId('invite-sent')).toBeTruthy());
    expect(calls.filter((c) => c.method === 'POST').map((c) => c.body)).toEqual([
      { email: 'ines@example.test', role: 'reviewer' },
    ]);
    expect(screen.getByTestId('invite-sent').textContent).toMatch(
      /^Invitation mailed to ines@example\.test as a reviewer\. Its link works once, until .*; the mail is in the Outbox\.$/,
    );
    // The list of open invitations is read again and shows the new one.
    await waitFor(() => expect(screen.getByTestId('open-invitations').textContent).toContain('ines@example.test'));
    expect(screen.getByTestId('open-invitations').textContent).toMatch(/as a reviewer · sent .* by Odile Marchetti/);
  });

  describe('the role column', () => {
    afterEach(() => setScreenWidth(0));
    /** The visible words "Role" on the screen, outside the invitation form (which has its own field label). */
    const roleLabels = () => screen.getAllByText('Role').filter((e) => !screen.getByTestId('invite-form').contains(e));

    it('is named once, by its column heading, on a wide screen; each role group still says whose role it is', async () => {
      setScreenWidth(1440);
      fakeApiRoutes({ 'GET /api/users': { status: 200, body: { users: [odile, ravi] } } });
      renderWithClient(<UsersList me={odile} />);
      await waitFor(() => screen.getByText('Ravi Dutta'));
      expect(roleLabels()).toHaveLength(1);
      expect(within(row('ravi@sheetkeeper.test')).queryByText('Role')).toBeNull();
      expect(screen.getByRole('radiogroup', { name: 'Role of Ravi Dutta' })).toBeTruthy();
      expect(within(row('ravi@sheetkeeper.test')).getByRole('radio', { name: 'Role: contributor' })).toBeTruthy();
    });

    it('keeps "Role" on each card of a phone, where no column heading names the chips', async () => {
      setScreenWidth(390);
      fakeApiRoutes({ 'GET /api/users': { status: 200, body: { users: [odile, ravi] } } });
      renderWithClient(<UsersList me={odile} />);
      await waitFor(() => screen.getByText('Ravi Dutta'));
      expect(within(row('ravi@sheetkeeper.test')).getByText('Role')).toBeTruthy();
      expect(within(row('odile@sheetkeeper.test')).getByText('Role')).toBeTruthy();
      expect(roleLabels()).toHaveLength(2);
      expect(screen.getByRole('radiogroup', { name: 'Role of Odile Marchetti' })).toBeTruthy();
    });
  });

  describe('cancelling an invitation', () => {
    const waiting = (email: string, id: string) => ({
      id,
      email,
      role: 'reviewer',
      sentBy: 'Odile Marchetti (odile@sheetkeeper.test)',
      sentAt: '2026-12-05T08:00:00.000Z',
      expiresAt: '2026-12-12T08:00:00.000Z',
    });
    const wrong = waiting('wrong@example.test', '00000000-0000-4000-8000-0000000000a1');
    const right = waiting('right@example.test', '00000000-0000-4000-8000-0000000000a2');

    it('cancels only after a question naming the address; the row leaves the list and a line says the link no longer works', async () => {
      let open = [wrong, right];
      const calls = fakeApiRoutes({
        'GET /api/users': { status: 200, body: { users: [odile] } },
        'GET /api/users/invitations': () => ({ status: 200, body: { invitations: open } }),
        [`POST /api/users/invitations/${wrong.id}/cancel`]: () => {
          open = [right];
          return {
            status: 200,
            body: { invitation: { id: wrong.id, email: wrong.email, cancelledAt: '2026-12-05T09:00:00.000Z' } },
          };
        },
      });
      renderWithClient(<UsersList me={odile} />);
      await waitFor(() => screen.getByTestId('invitation-wrong@example.test'));
      const item = screen.getByTestId('invitation-wrong@example.test');
      await click('Cancel invitation to wrong@example.test', item);
      expect(
        within(item).getByText(
          'Cancel the invitation to wrong@example.test? Its link stops working at once; you can invite the address again later.',
        ),
      ).toBeTruthy();
      // "Cancel" would be ambiguous beside "Cancel invitation": the way back says what it keeps.
      await click('Keep the invitation', item);
      expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
      expect(within(item).getByRole('button', { name: 'Cancel invitation to wrong@example.test' })).toBeTruthy();

      await click('Cancel invitation to wrong@example.test', item);
      await click('Yes, cancel it', item);
      await waitFor(() => expect(screen.queryByTestId('invitation-wrong@example.test')).toBeNull());
      expect(screen.getByTestId('invitation-cancelled').textContent).toBe(
        'Invitation to wrong@example.test cancelled: its link no longer works.',
      );
      expect(screen.getByTestId('invitation-right@example.test')).toBeTruthy();
      expect(calls.filter((c) => c.method === 'POST').map((c) => c.path)).toEqual([
        `/api/users/invitations/${wrong.id}/cancel`,
      ]);
    });

    it('stops saying "its link works … until" under the form once the invitation just sent is cancelled', async () => {
      const sent = waiting('oops@example.test', '00000000-0000-4000-8000-0000000000a3');
      let open: unknown[] = [];
      fakeApiRoutes({
        'GET /api/users': { status: 200, body: { users: [odile] } },
        'GET /api/users/invitations': () => ({ status: 200, body: { invitations: open } }),
        'POST /api/users/invitations': () => {
          open = [sent];
          return {
            status: 201,
            body: { invitation: { email: sent.email, role: 'reviewer', expiresAt: sent.expiresAt } },
          };
        },
        [`POST /api/users/invitations/${sent.id}/cancel`]: () => {
          open = [];
          return {
            status: 200,
            body: { invitation: { id: sent.id, email: sent.email, cancelledAt: '2026-12-05T09:00:00.000Z' } },
          };
        },
      });
      renderWithClient(<UsersList me={odile} />);
      await waitFor(() => screen.getByText('No invitation is waiting to be used.'));
      await act(() =>
        fireEvent.change(screen.getByLabelText('E-mail of the person to invite'), { target: { value: sent.email } }),
      );
      await click('Mail the invitation');
      await waitFor(() => screen.getByTestId('invitation-oops@example.test'));
      expect(screen.getByTestId('invite-sent').textContent).toMatch(/^Invitation mailed to oops@example\.test/);
      await click('Cancel invitation to oops@example.test');
      await click('Yes, cancel it');
      await waitFor(() => screen.getByTestId('invitation-cancelled'));
      expect(screen.queryByTestId('invite-sent')).toBeNull();

      // A new invitation to the same address is said again.
      await act(() =>
        fireEvent.change(screen.getByLabelText('E-mail of the person to invite'), { target: { value: sent.email } }),
      );
      await click('Mail the invitation');
      await waitFor(() => expect(screen.getByTestId('invite-sent').textContent).toMatch(/^Invitation mailed to oops/));
    });

    it("says the server's refusal when the invitation was used meanwhile, and lists what is really open", async () => {
      let open = [wrong];
      fakeApiRoutes({
        'GET /api/users': { status: 200, body: { users: [odile] } },
        'GET /api/users/invitations': () => ({ status: 200, body: { invitations: open } }),
        [`POST /api/users/invitations/${wrong.id}/cancel`]: () => {
          open = [];
          return {
            status: 409,
            body: {
              kind: 'conflict',
              message:
                'The invitation to wrong@example.test was used on 2026-12-05 and made an account; deactivate that account instead.',
            },
          };
        },
      });
      renderWithClient(<UsersList me={odile} />);
      await waitFor(() => screen.getByTestId('invitation-wrong@example.test'));
      await click('Cancel invitation to wrong@example.test');
      await click('Yes, cancel it');
      await waitFor(() =>
        expect(screen.getByRole('alert').textContent).toBe(
          '× The invitation to wrong@example.test was used on 2026-12-05 and made an account; deactivate that account instead.',
        ),
      );
      await waitFor(() => screen.getByText('No invitation is waiting to be used.'));
      expect(screen.queryByTestId('invitation-cancelled')).toBeNull();
    });
  });
});
