import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { TargetSourceList } from '../../../components/libraries/target-source-list';
import type { TargetSourceView } from '../../../shared/target-source-view';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const base = { addedBy: 'Odile', addedAt: '2026-12-05T06:00:00.000Z', resolvedAt: null, error: null, targetNames: [] };
const SOURCES: TargetSourceView[] = [
  {
    ...base,
    id: '11111111-1111-4111-8111-111111111111',
    source: { kind: 'npm', package: 'complex.js', version: '2.3.0' },
    state: 'resolving',
  },
  {
    ...base,
    id: '22222222-2222-4222-8222-222222222222',
    source: { kind: 'program', command: ['/usr/bin/python3', 'cmath_adapter.py'], name: 'cmath-copy@1' },
    state: 'ready',
    targetNames: ['cmath-copy@1'],
  },
  {
    ...base,
    id: '33333333-3333-4333-8333-333333333333',
    source: { kind: 'local', path: '/srv/complex.js' },
    state: 'failed',
    error: '/srv/complex.js has no package.json',
    addedBy: null,
  },
];

describe('TargetSourceList', () => {
  it('shows each source with its kind, its state in words and who added it', async () => {
    fakeApiRoutes({ 'GET /api/target-sources': { status: 200, body: { sources: SOURCES } } });
    renderWithClient(<TargetSourceList canRemove={false} />);
    const list = await screen.findByTestId('target-source-list');
    expect(list.textContent).toContain('npm package');
    expect(list.textContent).toContain('complex.js@2.3.0');
    expect(list.textContent).toContain('Getting it ready');
    expect(list.textContent).toContain('✓ Ready to plan: cmath-copy@1');
    expect(list.textContent).toContain('× Could not be used: /srv/complex.js has no package.json');
    expect(list.textContent).toContain('Added by Odile');
    expect(list.textContent).toContain('Added by a user no longer here');
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
  });

  it('removes a source for an admin only after asking', async () => {
    const calls = fakeApiRoutes({
      'GET /api/target-sources': { status: 200, body: { sources: SOURCES } },
      'DELETE /api/target-sources/22222222-2222-4222-8222-222222222222': { status: 204 },
    });
    renderWithClient(<TargetSourceList canRemove />);
    await act(async () => fireEvent.click(await screen.findByRole('button', { name: 'Remove cmath-copy@1' })));
    expect(screen.getByText(/plans keep naming them, and past runs and failures stay/)).toBeTruthy();
    expect(calls.some((c) => c.method === 'DELETE')).toBe(false);
    await act(async () => fireEvent.click(screen.getByRole('button', { name: 'Yes, remove' })));
    await waitFor(() =>
      expect(calls.filter((c) => c.method === 'DELETE').map((c) => c.path)).toEqual([
        '/api/target-sources/22222222-2222-4222-8222-222222222222',
      ]),
    );
    // Removing reads the list again and only then settles; waiting for that keeps every update inside the test.
    await waitFor(() =>
      expect(screen.getByRole('button', { name: 'Remove cmath-copy@1' }).getAttribute('aria-busy')).toBe('false'),
    );
  });
});
