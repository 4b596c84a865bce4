import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { SignInForm } from '../../../components/settings/sign-in-form';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';

const type = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const submit = () => act(() => fireEvent.click(screen.getByRole('button', { name: 'Sign in' })));

describe('SignInForm', () => {
  it('shows the broken rules beside the fields and sends nothing', async () => {
    const calls = mockFetch(200, {});
    renderWithClient(<SignInForm onSignedIn={jest.fn()} />);
    type('E-mail', 'not-an-address');
    await submit();
    expect(screen.getByText('× E-mail must be an e-mail address')).toBeTruthy();
    expect(screen.getByText('× Password is required')).toBeTruthy();
    expect(calls).toHaveLength(0);
  });

  it('clears a rule as soon as the field is fixed', async () => {
    mockFetch(200, {});
    renderWithClient(<SignInForm onSignedIn={jest.fn()} />);
    await submit();
    expect(screen.getByText('× E-mail is required')).toBeTruthy();
    type('E-mail', 'ravi@sheetkeeper.test');
    expect(screen.queryByText(/× E-mail/)).toBeNull();
  });

  it("shows the server's answer when the password is wrong, keeping what was typed", async () => {
    mockFetch(401, { kind: 'wrong-credentials', message: 'That e-mail and password do not match an account.' });
    const onSignedIn = jest.fn();
    renderWithClient(<SignInForm onSignedIn={onSignedIn} />);
    type('E-mail', 'ravi@sheetkeeper.test');
    type('Password', 'wrong');
    await submit();
    await waitFor(() => expect(screen.getByText('× That e-mail and password do not match an account.')).toBeTruthy());
    expect((screen.getByLabelText('E-mail') as HTMLInputElement).value).toBe('ravi@sheetkeeper.test');
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('posts the normalised body and reports success', async () => {
    const calls = mockFetch(200, {
      user: {
        id: 'u1',
        email: 'ravi@sheetkeeper.test',
        displayName: 'Ravi Dutta',
        role: 'contributor',
        createdAt: '2026-12-01T00:00:00Z',
      },
    });
    const onSignedIn = jest.fn();
    renderWithClient(<SignInForm onSignedIn={onSignedIn} />);
    type('E-mail', ' Ravi@Sheetkeeper.test ');
    type('Password', 'ravi-demo-2026');
    await submit();
    await waitFor(() => expect(onSignedIn).toHaveBeenCalled());
    expect(calls[0]!.url).toBe('/api/auth/sign-in');
    expect(JSON.parse(String(calls[0]!.init.body))).toEqual({
      email: 'ravi@sheetkeeper.test',
      password: 'ravi-demo-2026',
    });
  });

  it('says a deactivated account is deactivated, and whom to ask', async () => {
    const message =
      'This account is deactivated, so it cannot sign in. Ask an admin of your Sheetkeeper to reactivate it.';
    mockFetch(403, { kind: 'deactivated', message });
    renderWithClient(<SignInForm onSignedIn={jest.fn()} />);
    type('E-mail', 'hanne@sheetkeeper.test');
    type('Password', 'hanne-demo-2026');
    await submit();
    await waitFor(() => expect(screen.getByTestId('sign-in-server-error').textContent).toBe(`× ${message}`));
  });
});
