import { screen } from '@testing-library/react';
import LibrariesScreen from '../../../../app/(signed-in)/libraries/index';
import type { Role } from '../../../../shared/roles';
import type { TargetSourceView } from '../../../../shared/target-source-view';
import { fakeApiRoutes } from '../../../setup/fake-api-routes';
import { renderWithClient } from '../../../setup/render-with-client';
import { setScreenWidth } from '../../../setup/set-screen-width';

jest.mock('expo-router', () => jest.requireActual('../../../setup/expo-router-stub'));

const ADDED: TargetSourceView = {
  id: '22222222-2222-4222-8222-222222222222',
  source: { kind: 'program', command: ['/usr/bin/python3', 'cmath_adapter.py'], name: 'cmath-copy@1' },
  state: 'ready',
  targetNames: ['cmath-copy@1'],
  error: null,
  addedBy: 'Odile',
  addedAt: '2026-12-05T06:00:00.000Z',
  resolvedAt: '2026-12-05T06:00:01.000Z',
};

function showAs(role: Role) {
  fakeApiRoutes({
    'GET /api/me': {
      status: 200,
      body: { user: { id: 'u', email: 'x@sheetkeeper.test', displayName: 'X', role, createdAt: ADDED.addedAt } },
    },
    'GET /api/targets': { status: 200, body: { targets: [] } },
    'GET /api/target-sources': { status: 200, body: { sources: [ADDED] } },
  });
  renderWithClient(<LibrariesScreen />);
}

describe('the Libraries screen', () => {
  beforeEach(() => setScreenWidth(390));

  it('gives an admin the form and a remove button for each added target', async () => {
    showAs('admin');
    await screen.findByTestId('target-source-list');
    expect(await screen.findByTestId('target-source-form')).toBeTruthy();
    expect(screen.getByRole('button', { name: 'Remove cmath-copy@1' })).toBeTruthy();
  });

  it('shows everyone else the added targets without the form or the buttons', async () => {
    showAs('maintainer');
    const list = await screen.findByTestId('target-source-list');
    expect(list.textContent).toContain('✓ Ready to plan: cmath-copy@1');
    expect(screen.queryByTestId('target-source-form')).toBeNull();
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
  });

  it('names the browser tab after the screen', async () => {
    document.title = '';
    showAs('maintainer');
    await screen.findByTestId('target-source-list');
    expect(document.title).toBe('Libraries · Sheetkeeper');
  });
});
