import { act, fireEvent, screen, within } from '@testing-library/react';
import { FailureBrowser } from '../../../components/failures/failure-browser';
import { failureRows } from '../../setup/failure-rows';
import { mockFetchRoutes } from '../../setup/mock-fetch-routes';
import { renderWithClient } from '../../setup/render-with-client';
import { setScreenWidth } from '../../setup/set-screen-width';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const RUN = '11111111-1111-4111-8111-111111111111';

/** Two pages of 3 rows: the first says where the next starts. */
function twoPages() {
  return mockFetchRoutes((url) => {
    const u = new URL(url, 'http://x');
    if (u.searchParams.get('after') === '3:0') return { body: { failures: failureRows(3, 4), next: null } };
    return { body: { failures: failureRows(3, 1), next: '3:0' } };
  });
}

beforeEach(() => window.localStorage.clear());

describe('FailureBrowser', () => {
  it('shows cards on a phone, each a link to its case with the diagnosis in words and glyphs', async () => {
    setScreenWidth(390);
    twoPages();
    renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    const card = await screen.findByTestId('failure-card-1');
    expect(card.getAttribute('href')).toBe('/failures/1');
    expect(within(card).getByText('±')).toBeTruthy();
    expect(within(card).getByText(/zero sign/)).toBeTruthy();
    expect(within(card).getByText(/↑ regression/)).toBeTruthy();
    expect(within(screen.getByTestId('failure-card-2')).getByText('⇄')).toBeTruthy();
    expect(screen.queryByRole('table')).toBeNull();
  });

  it('shows every label of a point on its card, the leading one first', async () => {
    setScreenWidth(390);
    const [first, ...rest] = failureRows(2, 1);
    // A zero-sign point whose real part is also far off (the issue's "zero-sign hid a real part 104,212 ulps off").
    const inaccurate = { kind: 'inaccurate', ulps: 104212, relativeError: 2.3e-11, part: 're' } as const;
    mockFetchRoutes(() => ({
      body: { failures: [{ ...first!, labels: [first!.diagnosis!, inaccurate] }, ...rest], next: null },
    }));
    renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    const card = await screen.findByTestId('failure-card-1');
    const chips = within(card)
      .getAllByLabelText(/^diagnosis /)
      .map((e) => e.getAttribute('aria-label'));
    expect(chips).toEqual([
      'diagnosis ignored zero sign, imaginary part of the input',
      'diagnosis inaccurate, 104212 ulps in re',
    ]);
  });

  it('loads the next page with the cursor the first page gave, and stops when there is none', async () => {
    setScreenWidth(390);
    const calls = twoPages();
    renderWithClient(<FailureBrowser filters={{ run: RUN, diagnosis: 'zero-sign' }} onChange={jest.fn()} />);
    await screen.findByText('3 failures shown, more to load');
    expect(calls[0]!.url).toBe(`/api/failures?run=${RUN}&diagnosis=zero-sign&limit=50`);
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Load more' })));
    await screen.findByText('6 failures shown, all loaded');
    expect(calls[1]!.url).toBe(`/api/failures?run=${RUN}&diagnosis=zero-sign&after=3%3A0&limit=50`);
    expect(screen.getByTestId('failure-card-6')).toBeTruthy();
    expect(screen.queryByRole('button', { name: 'Load more' })).toBeNull();
  });

  it('shows a table on a wide screen whose columns are chosen and remembered in local storage', async () => {
    setScreenWidth(1440);
    twoPages();
    const first = renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    await screen.findByRole('table', { name: 'Failures' });
    expect(screen.getAllByRole('columnheader').map((h) => h.textContent)).toEqual([
      'No.',
      'Suite',
      'Target',
      'Path',
      'z',
      'Diagnosis',
      'Ulps',
      'Regression',
    ]);
    expect(screen.getByTestId('failure-row-2').getAttribute('href')).toBe('/failures/2');
    expect(within(screen.getByTestId('failure-row-2')).getByText('1.0e+18')).toBeTruthy();

    fireEvent.click(screen.getByRole('button', { name: 'Choose columns' }));
    expect(screen.getByRole('checkbox', { name: 'Show column Diagnosis' }).getAttribute('aria-disabled')).toBe('true');
    fireEvent.click(screen.getByRole('checkbox', { name: 'Show column Library' }));
    fireEvent.click(screen.getByRole('checkbox', { name: 'Show column Suite' }));
    expect(screen.getAllByRole('columnheader').map((h) => h.textContent)).toEqual([
      'No.',
      'Target',
      'Path',
      'z',
      'Library',
      'Diagnosis',
      'Ulps',
      'Regression',
    ]);
    expect(JSON.parse(window.localStorage.getItem('sheetkeeper.failure-table.columns')!)).toEqual([
      'id',
      'target',
      'path',
      'z',
      'actual',
      'diagnosis',
      'ulps',
      'new',
    ]);

    first.unmount();
    renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    await screen.findByRole('table', { name: 'Failures' });
    expect(screen.getAllByRole('columnheader').map((h) => h.textContent)).toContain('Library');
    expect(screen.getAllByRole('columnheader').map((h) => h.textContent)).not.toContain('Suite');
  });

  it('links the CSV export to the same filters, and says why it cannot export an unfiltered table', async () => {
    setScreenWidth(1440);
    twoPages();
    const { unmount } = renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    await screen.findByRole('table');
    expect(screen.getByText('Filter by a run, suite or target to export.')).toBeTruthy();
    expect(screen.queryByRole('link', { name: 'Export CSV' })).toBeNull();
    unmount();
    renderWithClient(<FailureBrowser filters={{ run: RUN, status: 'new', sort: 'ulps' }} onChange={jest.fn()} />);
    const link = await screen.findByRole('link', { name: 'Export CSV' });
    expect(link.getAttribute('href')).toBe(`/api/failures/export.csv?run=${RUN}&status=new`);
  });

  it('applies a chip at once and typed filters only when valid, naming the broken rule beside the field', async () => {
    setScreenWidth(1440);
    twoPages();
    const onChange = jest.fn();
    renderWithClient(<FailureBrowser filters={{ suite: 'sqrt-principal-sz' }} onChange={onChange} />);
    await screen.findByRole('table');
    fireEvent.click(screen.getByRole('radio', { name: 'Status: regressions' }));
    expect(onChange).toHaveBeenLastCalledWith({ suite: 'sqrt-principal-sz', status: 'new' });

    fireEvent.change(screen.getByLabelText('Run id'), { target: { value: 'not-a-run' } });
    fireEvent.click(screen.getByRole('button', { name: 'Apply filters' }));
    expect(
      screen.getByText('× Run id must be a run id or its first 8 or more characters, as in "Run 37e7ec6f"'),
    ).toBeTruthy();
    expect(onChange).toHaveBeenCalledTimes(1);

    fireEvent.change(screen.getByLabelText('Run id'), { target: { value: RUN } });
    fireEvent.change(screen.getByLabelText('Function'), { target: { value: 'asin' } });
    fireEvent.click(screen.getByRole('button', { name: 'Apply filters' }));
    expect(onChange).toHaveBeenLastCalledWith({ suite: 'sqrt-principal-sz', run: RUN, fn: 'asin' });
  });

  it('shows beside the Run id field why the server refused a short run id, on a phone too, with no retry', async () => {
    setScreenWidth(390);
    mockFetchRoutes(() => ({
      status: 400,
      body: {
        kind: 'invalid-input',
        message: 'The request is not valid.',
        issues: [
          {
            field: 'query.run',
            rule: `is the start of more than one run's id ("37e7ec6f"); type more of the id to tell them apart`,
          },
        ],
      },
    }));
    renderWithClient(<FailureBrowser filters={{ run: '37e7ec6f' }} onChange={jest.fn()} />);
    expect(
      await screen.findByText(
        `× Run id is the start of more than one run's id ("37e7ec6f"); type more of the id to tell them apart`,
      ),
    ).toBeTruthy();
    expect(screen.getByText('× No failures shown: change the filter marked above.')).toBeTruthy();
    expect(screen.queryByRole('button', { name: /retry|try again/i })).toBeNull();
    // Once the field is changed, the server's rule no longer describes it.
    fireEvent.change(screen.getByLabelText('Run id'), { target: { value: '37e7ec6f-1a' } });
    expect(screen.queryByText(/more than one run/)).toBeNull();
  });

  it('says so when nothing matches, and shows the error with a retry when the server fails', async () => {
    setScreenWidth(390);
    mockFetchRoutes(() => ({ body: { failures: [], next: null } }));
    const { unmount } = renderWithClient(<FailureBrowser filters={{ diagnosis: 'not-finite' }} onChange={jest.fn()} />);
    await screen.findByText('No failures match these filters.');
    unmount();
    mockFetchRoutes(() => ({ status: 500, body: { kind: 'server-error', message: 'The database is away.' } }));
    renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    await screen.findByText('× The database is away.');
    expect(screen.getByRole('button', { name: 'Try again' })).toBeTruthy();
  });

  it.each([
    ['phone', 390],
    ['wide screen', 1440],
  ])('marks a row that a decision in force covers, on a %s', async (_name, width) => {
    setScreenWidth(width);
    mockFetchRoutes(() => ({
      body: {
        failures: failureRows(2, 1),
        next: null,
        decisions: { 1: { id: 'd1', classification: 'accepted', expiresAt: '2099-01-31T00:00:00.000Z' } },
      },
    }));
    renderWithClient(<FailureBrowser filters={{}} onChange={jest.fn()} />);
    const marked = await screen.findByLabelText('A decision covers this failure: accepted until 2099-01-31');
    expect(marked.textContent).toBe('accepted until 2099-01-31');
    expect(screen.getAllByLabelText(/^A decision covers this failure/)).toHaveLength(1);
    // A wide row is a table row named by its label; a phone card is a link named by its words.
    const item = screen.queryByTestId('failure-row-1') ?? screen.getByTestId('failure-card-1');
    expect(item.getAttribute('href')).toBe('/failures/1');
    expect(item.getAttribute('aria-label') ?? item.textContent).toMatch(/accepted until 2099-01-31/);
  });
});
