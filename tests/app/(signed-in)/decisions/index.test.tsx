import { fireEvent, screen } from '@testing-library/react';
import DecisionsScreen from '../../../../app/(signed-in)/decisions/index';
import { decisionViews } from '../../../setup/decision-views';
import { mockFetchRoutes } from '../../../setup/mock-fetch-routes';
import { renderWithClient } from '../../../setup/render-with-client';

let mockParams: Record<string, string> = {};
const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  ...jest.requireActual('../../../setup/expo-router-stub'),
  useLocalSearchParams: () => mockParams,
  router: { push: (to: unknown) => mockPush(to) },
}));
jest.mock('expo-router/head', () => ({ __esModule: true, default: () => null }));

describe('the Decisions screen', () => {
  beforeEach(() => mockPush.mockClear());

  it('opens filtered by the library in the address, and leaves out a filter its schema refuses', async () => {
    mockParams = { library: 'complex.js', suite: 'x\u0000', id: 'not-an-id' };
    const calls = mockFetchRoutes((url) =>
      url.endsWith('/me')
        ? { body: { user: { id: 'u', email: 'k@x.test', displayName: 'K', role: 'maintainer' } } }
        : { body: { deviations: decisionViews() } },
    );
    renderWithClient(<DecisionsScreen />);
    await screen.findByText(/^3 decisions:/);
    expect(calls.map((c) => c.url).filter((u) => u.includes('/deviations'))).toEqual([
      '/api/deviations',
      '/api/deviations?library=complex.js',
    ]);
    fireEvent.click(screen.getByRole('radio', { name: 'Suite: sqrt-principal' }));
    expect(mockPush).toHaveBeenCalledWith({
      pathname: '/decisions',
      params: { library: 'complex.js', suite: 'sqrt-principal' },
    });
  });
});
