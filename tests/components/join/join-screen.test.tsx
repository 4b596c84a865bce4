import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { JoinScreen } from '../../../components/join/join-screen';
import type { AccountLinkView } from '../../../shared/account-link-view';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const TOKEN = `skl_${'a'.repeat(43)}`;
const invitation: AccountLinkView = {
  kind: 'invitation',
  email: 'ines@example.test',
  role: 'reviewer',
  displayName: null,
  sentBy: 'Odile Marchetti (odile@sheetkeeper.test)',
  expiresAt: '2026-12-12T08:00:00.000Z',
};
const type = (label: string, value: string) =>
  act(() => fireEvent.change(screen.getByLabelText(label), { target: { value } }));

describe('JoinScreen', () => {
  it('takes a name and a password for an invitation, checks them, and signs the person in', async () => {
    const calls = fakeApiRoutes({
      'POST /api/account-links/lookup': { status: 200, body: { link: invitation } },
      'POST /api/account-links/use': (body) => ({
        status: 200,
        body: {
          user: { id: 'u', email: 'ines@example.test', displayName: (body as { displayName: string }).displayName },
        },
      }),
    });
    const onDone = jest.fn();
    renderWithClient(<JoinScreen token={TOKEN} onDone={onDone} />);
    await waitFor(() => screen.getByText(/invites ines@example\.test to Sheetkeeper as a reviewer/));
    expect(screen.getByRole('heading').textContent).toBe('Join Sheetkeeper');
    await type('New password', 'short');
    await type('The same password again', 'shorter');
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Make my account and sign in' })));
    expect(screen.getByText('× Your name is required')).toBeTruthy();
    expect(screen.getByText('× New password must be at least 12 characters')).toBeTruthy();
    expect(screen.getByText('× The same password again must be the same password')).toBeTruthy();
    expect(calls.filter((c) => c.path === '/api/account-links/use')).toEqual([]);

    await type('Your name', 'Inès Arbeloa');
    await type('New password', 'a long new password');
    await type('The same password again', 'a long new password');
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Make my account and sign in' })));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(calls.find((c) => c.path === '/api/account-links/use')!.body).toEqual({
      token: TOKEN,
      password: 'a long new password',
      displayName: 'Inès Arbeloa',
    });
  });

  it('asks only for a password on a reset link', async () => {
    fakeApiRoutes({
      'POST /api/account-links/lookup': {
        status: 200,
        body: {
          link: { ...invitation, kind: 'password-reset', displayName: 'Ravi Dutta', email: 'ravi@sheetkeeper.test' },
        },
      },
    });
    renderWithClient(<JoinScreen token={TOKEN} onDone={jest.fn()} />);
    await waitFor(() => screen.getByText(/Choose a new password for Ravi Dutta \(ravi@sheetkeeper\.test\)/));
    expect(screen.getByRole('heading').textContent).toBe('Choose a new password');
    expect(screen.queryByLabelText('Your name')).toBeNull();
    expect(screen.getByRole('button', { name: 'Set the password and sign in' })).toBeTruthy();
  });

  it('says plainly why a used link cannot be used and whom to ask, with no form', async () => {
    const message =
      'This invitation was used on 2026-12-05: sign in with the password chosen then, or ask Odile Marchetti (odile@sheetkeeper.test) for a new one.';
    fakeApiRoutes({ 'POST /api/account-links/lookup': { status: 410, body: { kind: 'link-unusable', message } } });
    renderWithClient(<JoinScreen token={TOKEN} onDone={jest.fn()} />);
    await waitFor(() => expect(screen.getByTestId('join-unusable').textContent).toBe(message));
    expect(screen.getByRole('heading').textContent).toBe('This link cannot be used');
    expect(screen.queryByLabelText('New password')).toBeNull();
    expect(screen.getByRole('link', { name: 'Go to sign-in' }).getAttribute('href')).toBe('/sign-in');
  });

  it('explains a page opened without a link and asks nothing of the server', async () => {
    const calls = fakeApiRoutes({});
    renderWithClient(<JoinScreen token={null} onDone={jest.fn()} />);
    expect(screen.getByTestId('join-unusable').textContent).toMatch(/ask an admin of your Sheetkeeper for a new one/);
    expect(calls).toEqual([]);
  });
});
