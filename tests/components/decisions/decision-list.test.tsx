import { act, fireEvent, screen, within } from '@testing-library/react';
import { DecisionList } from '../../../components/decisions/decision-list';
import type { Role } from '../../../shared/roles';
import { decisionViews } from '../../setup/decision-views';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const [inForce, bug, expired] = decisionViews();

/** The API as the screen reads it, signed in as `role`; a revoke answers with the decision revoked. */
function serve(role: Role) {
  let revoked = false;
  return mockFetchRoutes((url, method) => {
    if (url.endsWith('/me')) return { body: { user: { id: 'u', email: 'x@x.test', displayName: 'X', role } } };
    if (method === 'POST' && url.endsWith(`/deviations/${inForce!.id}/revoke`)) {
      revoked = true;
      return { body: { deviation: { ...inForce, state: 'revoked', revokedAt: '2026-12-05T09:00:00.000Z' } } };
    }
    const u = new URL(url, 'http://x');
    const current = [
      revoked ? { ...inForce!, state: 'revoked', revokedAt: '2026-12-05T09:00:00.000Z' } : inForce!,
      bug!,
      expired!,
    ];
    const library = u.searchParams.get('library');
    return { body: { deviations: current.filter((d) => !library || d.targetKey === library) } };
  });
}

describe('DecisionList', () => {
  it('lists each decision with its scope in words, expiry, author and state, expired ones marked as expired', async () => {
    serve('maintainer');
    renderWithClient(<DecisionList filters={{}} onChange={jest.fn()} />);
    const first = await screen.findByTestId(`decision-${inForce!.id}`);
    expect(within(first).getByText('Accepted deviation')).toBeTruthy();
    expect(within(first).getByText(/in force until 2099-01-31/)).toBeTruthy();
    expect(
      within(first).getByText(
        'Covers every failure on path “along the cut” of suite sqrt-principal on complex.js 2.4.3 only.',
      ),
    ).toBeTruthy();
    expect(within(first).getByText(/^Decided by Hanne Lindqvist on/)).toBeTruthy();
    expect(within(first).getByRole('link', { name: 'Given on failure #7' }).getAttribute('href')).toBe('/failures/7');
    expect(
      within(screen.getByTestId(`decision-${bug!.id}`)).getByText(
        'Covers every failure in suite acos-principal on every version of complex.js, earlier ones and runs already stored included.',
      ),
    ).toBeTruthy();
    const past = screen.getByTestId(`decision-${expired!.id}`);
    expect(within(past).getByText(/expired on 2026-11-30: no longer applies/)).toBeTruthy();
    expect(screen.getByText('3 decisions: 2 in force, 1 expired, 0 revoked')).toBeTruthy();
    // A maintainer reads decisions; revoking one is a reviewer's.
    expect(screen.queryByRole('button', { name: /^Revoke/ })).toBeNull();
  });

  it('filters by library and suite with chips built from the decisions there are', async () => {
    serve('reviewer');
    const onChange = jest.fn();
    renderWithClient(<DecisionList filters={{}} onChange={onChange} />);
    await screen.findByTestId(`decision-${inForce!.id}`);
    expect(screen.getAllByRole('radio', { name: /^Library:/ }).map((r) => r.getAttribute('aria-label'))).toEqual([
      'Library: any',
      'Library: complex.js',
      'Library: mathjs/number',
    ]);
    // An expired decision no longer applies, so there is nothing to revoke.
    expect(within(screen.getByTestId(`decision-${expired!.id}`)).queryByRole('button', { name: /^Revoke/ })).toBeNull();
    fireEvent.click(screen.getByRole('radio', { name: 'Library: mathjs/number' }));
    expect(onChange).toHaveBeenLastCalledWith({ library: 'mathjs/number', suite: undefined });
    fireEvent.click(screen.getByRole('radio', { name: 'Suite: acos-principal' }));
    expect(onChange).toHaveBeenLastCalledWith({ suite: 'acos-principal' });
  });

  it('revokes a decision only after a second tap, then says it is revoked and keeps it listed as revoked', async () => {
    const calls = serve('reviewer');
    renderWithClient(<DecisionList filters={{}} onChange={jest.fn()} />);
    const row = await screen.findByTestId(`decision-${inForce!.id}`);
    await act(() =>
      fireEvent.click(within(row).getByRole('button', { name: 'Revoke the accepted deviation on sqrt-principal' })),
    );
    expect(calls.filter((c) => c.init.method === 'POST')).toHaveLength(0);
    expect(within(row).getByText(/^Revoke this accepted deviation\?/)).toBeTruthy();
    await act(() => fireEvent.click(within(row).getByRole('button', { name: 'Yes, revoke' })));
    await screen.findByText(
      '✓ Revoked: the accepted deviation on sqrt-principal no longer applies. It stays listed below as revoked.',
    );
    expect(calls.filter((c) => c.init.method === 'POST').map((c) => c.url)).toEqual([
      `/api/deviations/${inForce!.id}/revoke`,
    ]);
    await within(screen.getByTestId(`decision-${inForce!.id}`)).findByText(/revoked on 2026-12-05: no longer applies/);
    expect(screen.getByText('3 decisions: 1 in force, 1 expired, 1 revoked')).toBeTruthy();
  });
});
