import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { TokenList } from '../../../components/settings/token-list';
import type { TokenView } from '../../../shared/token-view';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const active: TokenView = {
  id: '9d8c7b6a-5f4e-4d3c-8b2a-1f0e9d8c7b6a',
  name: 'complex.js CI',
  prefix: 'skt_AbCdEf',
  createdAt: '2026-03-01T10:00:00.000Z',
  lastUsedAt: null,
  revokedAt: null,
};

describe('TokenList', () => {
  it('revokes a token only after the confirm step, then shows it revoked', async () => {
    let stored = active;
    const calls = fakeApiRoutes({
      'GET /api/tokens': () => ({ status: 200, body: { tokens: [stored] } }),
      [`POST /api/tokens/${active.id}/revoke`]: () => {
        stored = { ...active, revokedAt: '2026-03-02T09:00:00.000Z' };
        return { status: 200, body: { token: stored } };
      },
    });
    renderWithClient(<TokenList />);
    await waitFor(() => screen.getByText('complex.js CI'));
    expect(screen.getByText('never used', { exact: false })).toBeTruthy();
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Revoke token complex.js CI' })));
    expect(calls.some((c) => c.method === 'POST')).toBe(false);
    expect(screen.getByText(/Anything using it gets “not valid” from now on/)).toBeTruthy();
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Yes, revoke' })));
    await waitFor(() => expect(screen.getByText(/^− Revoked /)).toBeTruthy());
    expect(screen.queryByRole('button', { name: 'Revoke token complex.js CI' })).toBeNull();
  });

  it('cancels the confirm step without revoking', async () => {
    const calls = fakeApiRoutes({ 'GET /api/tokens': { status: 200, body: { tokens: [active] } } });
    renderWithClient(<TokenList />);
    await waitFor(() => screen.getByText('complex.js CI'));
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Revoke token complex.js CI' })));
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Cancel' })));
    expect(screen.getByText('✓ Active')).toBeTruthy();
    expect(calls.filter((c) => c.method === 'POST')).toEqual([]);
  });
});
