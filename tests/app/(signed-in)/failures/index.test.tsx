import { fireEvent, screen } from '@testing-library/react';
import FailuresScreen from '../../../../app/(signed-in)/failures/index';
import { failureRows } from '../../../setup/failure-rows';
import { mockFetchRoutes } from '../../../setup/mock-fetch-routes';
import { renderWithClient } from '../../../setup/render-with-client';
import { setScreenWidth } from '../../../setup/set-screen-width';

let mockParams: Record<string, string> = {};
const mockPush = jest.fn();
jest.mock('expo-router', () => ({
  ...jest.requireActual('../../../setup/expo-router-stub'),
  useLocalSearchParams: () => mockParams,
  router: { push: (to: unknown) => mockPush(to) },
}));

const RUN = '22222222-2222-4222-8222-222222222222';

describe('the Failures screen', () => {
  beforeEach(() => {
    mockPush.mockClear();
    setScreenWidth(1440);
  });

  it('opens filtered by the run, suite and target a link carries', async () => {
    mockParams = { run: RUN, suite: 'sqrt-principal-sz', target: 'complex.js@2.4.3' };
    const calls = mockFetchRoutes(() => ({ body: { failures: failureRows(2), next: null } }));
    renderWithClient(<FailuresScreen />);
    await screen.findByRole('table');
    expect(calls[0]!.url).toBe(`/api/failures?run=${RUN}&suite=sqrt-principal-sz&target=complex.js%402.4.3&limit=50`);
    expect((screen.getByLabelText('Suite') as HTMLInputElement).value).toBe('sqrt-principal-sz');
  });

  it('puts a changed filter into the address, keeping the others', async () => {
    mockParams = { run: RUN, sort: 'ulps' };
    mockFetchRoutes(() => ({ body: { failures: failureRows(2), next: null } }));
    renderWithClient(<FailuresScreen />);
    await screen.findByRole('table');
    fireEvent.click(screen.getByRole('radio', { name: 'Diagnosis: wrong side of a cut' }));
    expect(mockPush).toHaveBeenCalledWith({
      pathname: '/failures',
      params: { run: RUN, sort: 'ulps', diagnosis: 'cut-side' },
    });
    fireEvent.click(screen.getByRole('radio', { name: 'Branch findings first, then: newest first' }));
    expect(mockPush).toHaveBeenLastCalledWith({ pathname: '/failures', params: { run: RUN } });
  });

  it('filters by class of finding, from a chip and from a link', async () => {
    mockParams = { run: RUN, class: 'branch' };
    const calls = mockFetchRoutes(() => ({ body: { failures: failureRows(2), next: null } }));
    renderWithClient(<FailuresScreen />);
    await screen.findByRole('table');
    expect(calls[0]!.url).toBe(`/api/failures?run=${RUN}&class=branch&limit=50`);
    fireEvent.click(screen.getByRole('radio', { name: 'Class: accuracy findings' }));
    expect(mockPush).toHaveBeenCalledWith({ pathname: '/failures', params: { run: RUN, class: 'accuracy' } });
  });

  it('drops a parameter the server would refuse and says so, applying the rest', async () => {
    mockParams = { run: 'nonsense', diagnosis: 'zero-sign' };
    const calls = mockFetchRoutes(() => ({ body: { failures: failureRows(1), next: null } }));
    renderWithClient(<FailuresScreen />);
    await screen.findByRole('table');
    expect(screen.getByText("× The link's run could not be read and is not applied.")).toBeTruthy();
    expect(calls[0]!.url).toBe('/api/failures?diagnosis=zero-sign&limit=50');
  });
});
