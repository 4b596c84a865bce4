import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { NewTokenForm } from '../../../components/settings/new-token-form';
import { STORABLE_TEXT_RULE } from '../../../shared/schemas/text-schema';
import type { TokenView } from '../../../shared/token-view';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const SECRET = 'skt_Q2hvb3NlIGEgbG9uZyByYW5kb20gc2VjcmV0IGhlcmU';
const token: TokenView = {
  id: '0b5e2a7c-3f41-4d6e-9a8b-7c6d5e4f3a21',
  name: 'complex.js CI',
  prefix: SECRET.slice(0, 10),
  createdAt: '2026-03-01T10:00:00.000Z',
  lastUsedAt: null,
  revokedAt: null,
};

const type = (value: string) => fireEvent.change(screen.getByLabelText('Token name'), { target: { value } });
const make = () => act(() => fireEvent.click(screen.getByRole('button', { name: 'Make token' })));

describe('NewTokenForm', () => {
  it('shows the secret once with the warning and a copy button, and never again after it is put away', async () => {
    const calls = fakeApiRoutes({ 'POST /api/tokens': { status: 201, body: { token, secret: SECRET } } });
    const writeText = jest.fn(async () => undefined);
    Object.defineProperty(navigator, 'clipboard', { value: { writeText }, configurable: true });
    renderWithClient(<NewTokenForm />);
    type('  complex.js CI ');
    await make();
    await waitFor(() => expect(screen.getByText(SECRET)).toBeTruthy());
    expect(calls).toEqual([{ method: 'POST', path: '/api/tokens', body: { name: 'complex.js CI' } }]);
    expect(screen.getByText(/you will not see this again/)).toBeTruthy();

    await act(async () => fireEvent.click(screen.getByRole('button', { name: 'Copy the token' })));
    expect(writeText).toHaveBeenCalledWith(SECRET);
    await waitFor(() => expect(screen.getByText('✓ Copied')).toBeTruthy());

    await act(() => fireEvent.click(screen.getByRole('button', { name: 'I have stored it' })));
    expect(screen.queryByText(SECRET)).toBeNull();
    expect(document.body.textContent).not.toContain(SECRET);
    // The form is ready for the next token, empty.
    expect((screen.getByLabelText('Token name') as HTMLInputElement).value).toBe('');
  });

  it('says how to copy by hand when the browser refuses the clipboard', async () => {
    fakeApiRoutes({ 'POST /api/tokens': { status: 201, body: { token, secret: SECRET } } });
    Object.defineProperty(navigator, 'clipboard', {
      value: { writeText: jest.fn(async () => Promise.reject(new Error('denied'))) },
      configurable: true,
    });
    renderWithClient(<NewTokenForm />);
    type('complex.js CI');
    await make();
    await waitFor(() => expect(screen.getByText(SECRET)).toBeTruthy());
    await act(async () => fireEvent.click(screen.getByRole('button', { name: 'Copy the token' })));
    await waitFor(() => expect(screen.getByText(/select the text above and copy it by hand/)).toBeTruthy());
    expect(screen.getByText(SECRET)).toBeTruthy();
  });

  it('refuses a name that is too short beside the field, sending nothing', async () => {
    const calls = fakeApiRoutes({});
    renderWithClient(<NewTokenForm />);
    type('ci');
    await make();
    expect(screen.getByText('× Token name must be at least 3 characters')).toBeTruthy();
    expect(calls).toEqual([]);
  });

  it('refuses a NUL character beside the field with the rule the server states, sending nothing', async () => {
    const calls = fakeApiRoutes({});
    renderWithClient(<NewTokenForm />);
    type('complex.js\u0000CI');
    await make();
    expect(screen.getByText(`× Token name ${STORABLE_TEXT_RULE}`)).toBeTruthy();
    expect(calls).toEqual([]);
  });

  it("shows the server's rule beside the field and keeps the name typed", async () => {
    fakeApiRoutes({
      'POST /api/tokens': {
        status: 400,
        body: {
          kind: 'invalid-input',
          message: 'invalid input',
          issues: [{ field: 'body.name', rule: 'must be at most 80 characters' }],
        },
      },
    });
    renderWithClient(<NewTokenForm />);
    type('a name the server refuses');
    await make();
    await waitFor(() => expect(screen.getByText('× Token name must be at most 80 characters')).toBeTruthy());
    expect((screen.getByLabelText('Token name') as HTMLInputElement).value).toBe('a name the server refuses');
    expect(screen.queryByTestId('new-token-secret')).toBeNull();
  });
});
