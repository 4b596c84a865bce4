import { act, fireEvent, screen, waitFor, within } from '@testing-library/react';
import { emptySuiteDraft } from '../../../../components/suites/editor/empty-suite-draft';
import { suiteToDraft } from '../../../../components/suites/editor/suite-to-draft';
import { validateSuite } from '../../../../shared/validate-suite';
import sqrtDemo from '../../../../suites/demo/sqrt-principal-sz.json';
import type { SuiteDraft } from '../../../../components/suites/editor/suite-draft';
import { SuiteForm } from '../../../../components/suites/editor/suite-form';
import { mockFetch } from '../../../setup/mock-fetch';
import { renderWithClient } from '../../../setup/render-with-client';

const type = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const press = (name: string) => act(() => fireEvent.click(screen.getByRole('button', { name })));
// The harness's suite tools load on demand (mathjs's parser); the first load in a fresh jest cache takes seconds.
jest.setTimeout(60_000);
const toolsLoaded = () => screen.findByTestId('suite-preview-summary', {}, { timeout: 45_000 });
const fieldOf = (label: string) => screen.getByLabelText(label).parentElement as HTMLElement;

/** (z(z−1))^{1/3} fixed by its principal value at 2, with the single finite cut [0, 1]: the loop around that cut has monodromy e^{2πi·2/3}. */
const badLayout = (): SuiteDraft => ({
  ...emptySuiteDraft(),
  id: 'cube-root-of-z-z-minus-1',
  title: 'Cube root of z(z−1), one cut from 0 through 1 to infinity',
  subject: 'cbrt(z*(z - 1))',
  branchKind: 'regular',
  g: 'z*(z - 1)',
  nuRe: '1/3',
  z0: { re: '2', im: '0' },
  fixBy: 'k',
  k: '0',
  cuts: [
    {
      points: [
        { re: '0', im: '0' },
        { re: '1', im: '0' },
      ],
      toInfinity: false,
    },
  ],
});

const DRAFT_KEY = 'sheetkeeper.suite-draft.test-user.new';
/** What the form has kept on this device, as stored. */
const keptValue = () => JSON.parse(window.localStorage.getItem(DRAFT_KEY) ?? 'null')?.value as SuiteDraft | undefined;

beforeEach(() => window.localStorage.clear());

const savedVersion = {
  version: { id: 'v1', suiteId: 's1', slug: 'cube-root-of-z-z-minus-1', version: 1, status: 'draft' },
};

describe('SuiteForm', () => {
  it('shows a broken rule beside its field as soon as the field is touched', async () => {
    mockFetch(201, savedVersion);
    renderWithClient(<SuiteForm initial={emptySuiteDraft()} editing={null} draftKey={DRAFT_KEY} onDone={jest.fn()} />);
    await toolsLoaded();
    type('Title', 'ab');
    await waitFor(() =>
      expect(within(fieldOf('Title')).getByText('× Title must be at least 3 characters')).toBeTruthy(),
    );
    expect(screen.queryByText(/× Id /)).toBeNull();
    type('Title', 'Square root along the unit circle');
    await waitFor(() => expect(within(fieldOf('Title')).queryByText(/× Title/)).toBeNull());
  });

  it('refuses an invalid cut layout naming the failing loop, sends nothing, and the fix clears it', async () => {
    const calls = mockFetch(201, savedVersion);
    const onDone = jest.fn();
    renderWithClient(<SuiteForm initial={badLayout()} editing={null} draftKey={DRAFT_KEY} onDone={onDone} />);
    await toolsLoaded();
    await press('Save draft');
    const layoutRules = await screen.findByTestId('cut-layout-rules');
    expect(layoutRules.textContent).toMatch(
      /a loop around the cut through \(0, 0\), \(1, 0\) crosses no cut, yet going once around it multiplies the value by e2πi·2\/3, not 1/,
    );
    // The factor is maths: e with 2πi·2/3 raised, never the raw e^{2πi·2/3}.
    expect(within(layoutRules).getByText('2πi·2/3').style.verticalAlign).toBe('top');
    expect(layoutRules.textContent).not.toMatch(/\^|ν·\(Z−P\)/);
    expect(screen.getByTestId('suite-form-refused').textContent).toMatch(/Not saved: 1 rule is broken/);
    expect(calls).toHaveLength(0);

    await act(() => fireEvent.click(screen.getByRole('checkbox', { name: 'Cut 1 continues to infinity' })));
    await waitFor(() => expect(screen.queryByTestId('cut-layout-rules')).toBeNull());
    await press('Save draft');
    await waitFor(() => expect(onDone).toHaveBeenCalledWith('cube-root-of-z-z-minus-1', false));
    expect(calls[0]!.url).toBe('/api/suites');
    expect(JSON.parse(String(calls[0]!.init.body)).branch).toEqual({
      kind: 'regular',
      g: 'z*(z - 1)',
      nu: '1/3',
      z0: { re: '2', im: '0' },
      k: 0,
      cuts: [
        {
          points: [
            { re: '0', im: '0' },
            { re: '1', im: '0' },
          ],
          to_infinity: true,
        },
      ],
    });
  });

  it('names an uncut branch point when the cut is removed', async () => {
    mockFetch(201, savedVersion);
    renderWithClient(
      <SuiteForm
        initial={{
          ...badLayout(),
          cuts: [
            {
              points: [
                { re: '0', im: '0' },
                { re: '1', im: '0' },
              ],
              toInfinity: true,
            },
          ],
        }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={jest.fn()}
      />,
    );
    await toolsLoaded();
    await press('Remove cut 1');
    const layoutRules = await screen.findByTestId('cut-layout-rules');
    expect(layoutRules.textContent).toMatch(
      /branch point at \((0|1), 0\) lies on no cut: it is a zero of g of order 1/,
    );
  });

  it('shows the server’s rules beside their fields, keeps everything typed, and drops a rule once its field changes', async () => {
    const calls = mockFetch(400, {
      kind: 'invalid-input',
      message: 'invalid',
      issues: [{ field: 'body.paths.0.radius', rule: 'must not reach the branch point at 0' }],
    });
    const onDone = jest.fn();
    renderWithClient(
      <SuiteForm
        initial={{
          ...badLayout(),
          cuts: [
            {
              points: [
                { re: '0', im: '0' },
                { re: '1', im: '0' },
              ],
              toInfinity: true,
            },
          ],
        }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={onDone}
      />,
    );
    await toolsLoaded();
    type('Story', 'Ravi wants the cube root continuous across the negative real axis.');
    await press('Save draft');
    await waitFor(() =>
      expect(within(fieldOf('Path 1 radius')).getByText('× Radius must not reach the branch point at 0')).toBeTruthy(),
    );
    expect(calls).toHaveLength(1);
    expect(onDone).not.toHaveBeenCalled();
    expect((screen.getByLabelText('Story') as HTMLTextAreaElement).value).toBe(
      'Ravi wants the cube root continuous across the negative real axis.',
    );
    expect((screen.getByLabelText('g(z)') as HTMLInputElement).value).toBe('z*(z - 1)');
    expect((screen.getByLabelText('Cut 1 point 2, real part') as HTMLInputElement).value).toBe('1');
    expect(screen.getByTestId('suite-form-server-message').textContent).toMatch(/beside their fields/);
    type('Path 1 radius', '3');
    await waitFor(() => expect(screen.queryByText('× Radius must not reach the branch point at 0')).toBeNull());
  });

  it('shows a refusal that names no field above the buttons', async () => {
    mockFetch(409, {
      kind: 'conflict',
      message: 'A suite with the id "cube-root-of-z-z-minus-1" exists already: edit it instead.',
    });
    renderWithClient(
      <SuiteForm
        initial={{
          ...badLayout(),
          cuts: [
            {
              points: [
                { re: '0', im: '0' },
                { re: '1', im: '0' },
              ],
              toInfinity: true,
            },
          ],
        }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={jest.fn()}
      />,
    );
    await toolsLoaded();
    await press('Save draft');
    await waitFor(() =>
      expect(screen.getByTestId('suite-form-server-message').textContent).toMatch(/exists already: edit it instead/),
    );
    expect((screen.getByLabelText('Id') as HTMLInputElement).value).toBe('cube-root-of-z-z-minus-1');
  });

  it('saves and then submits for review', async () => {
    const calls = mockFetch(201, savedVersion);
    const onDone = jest.fn();
    renderWithClient(
      <SuiteForm
        initial={{
          ...badLayout(),
          cuts: [
            {
              points: [
                { re: '0', im: '0' },
                { re: '1', im: '0' },
              ],
              toInfinity: true,
            },
          ],
        }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={onDone}
      />,
    );
    await toolsLoaded();
    await press('Save and submit for review');
    await waitFor(() => expect(onDone).toHaveBeenCalledWith('cube-root-of-z-z-minus-1', true));
    expect(calls.map((c) => [c.init.method, c.url])).toEqual([
      ['POST', '/api/suites'],
      ['POST', '/api/suites/cube-root-of-z-z-minus-1/submit'],
    ]);
  });

  it('keeps a tolerance with both bounds through an edit: ulps per part or relative error', async () => {
    const checked = validateSuite(sqrtDemo, 'sqrt-principal-sz.json');
    if (!checked.ok) throw new Error('the demo suite does not validate');
    const calls = mockFetch(201, savedVersion);
    renderWithClient(
      <SuiteForm
        initial={{ ...suiteToDraft(checked.suite), id: 'sqrt-copy' }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={jest.fn()}
      />,
    );
    await toolsLoaded();
    expect((screen.getByLabelText('Values relative tolerance') as HTMLInputElement).value).toBe(
      '8.881784197001252e-16',
    );
    type('Values relative tolerance', '1e-15');
    await press('Save draft');
    await waitFor(() => expect(calls).toHaveLength(1));
    const body = JSON.parse(String(calls[0]!.init.body)) as { tolerances: { values: unknown } };
    expect(body.tolerances.values).toEqual({ ulps: 4, relative: 1e-15 });
  });

  it('writes a list of points, draws it in the picture, and saves it with a counterpart', async () => {
    const calls = mockFetch(201, savedVersion);
    const onDone = jest.fn();
    renderWithClient(
      <SuiteForm
        initial={{ ...emptySuiteDraft(), id: 'sqrt-against-half-power', title: 'sqrt and z^(1/2)', subject: 'sqrt(z)' }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={onDone}
      />,
    );
    await toolsLoaded();
    await act(() => fireEvent.click(screen.getByRole('radio', { name: 'Path 1 kind: points' })));
    expect(screen.getByText(/A list is not a path: jumps and monodromy are not checked on it/)).toBeTruthy();
    type('Path 1 point 1, real part', '-4');
    type('Path 1 point 1, imaginary part', '-0');
    type('Path 1 point 2, real part', '-4');
    type('Path 1 point 2, imaginary part', '0');
    await press('Add a path 1 point');
    // Three points, drawn as points (the same suitePicture the runner's path builder feeds).
    await waitFor(() => expect(screen.getByTestId('suite-preview-summary').textContent).toMatch(/1 path \(3 points\)/));
    type('Path 1 point 3, real part', 'minus one');
    await press('Save draft');
    await waitFor(() =>
      expect(within(fieldOf('Path 1 point 3, real part')).getByText(/re must be a decimal, a hex float/)).toBeTruthy(),
    );
    expect(calls).toHaveLength(0);
    type('Path 1 point 3, real part', '-1');

    await press('+ Add a counterpart');
    await press('Save draft');
    await waitFor(() =>
      expect(within(fieldOf('Counterpart 1 subject')).getByText(/give a subject, an entry or both/)).toBeTruthy(),
    );
    type('Counterpart 1 subject', 'z^(1/2)');
    await press('Save draft');
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    const body = JSON.parse(String(calls[0]!.init.body));
    expect(body.paths[0]).toEqual({
      kind: 'points',
      name: 'circle of radius 2',
      points: [
        { re: '-4', im: '-0' },
        { re: '-4', im: '0' },
        { re: '-1', im: '0' },
      ],
    });
    expect(body.counterparts).toEqual([{ subject: 'z^(1/2)' }]);
  });

  it('keeps unsaved typing on this device and offers it back when the form opens again', async () => {
    mockFetch(201, savedVersion);
    const first = renderWithClient(
      <SuiteForm initial={emptySuiteDraft()} editing={null} draftKey={DRAFT_KEY} onDone={jest.fn()} />,
    );
    await toolsLoaded();
    expect(screen.queryByTestId('kept-draft-notice')).toBeNull();
    type('Title', 'Square root along the unit circle');
    await waitFor(() => expect(keptValue()?.title).toBe('Square root along the unit circle'));
    first.unmount();

    renderWithClient(<SuiteForm initial={emptySuiteDraft()} editing={null} draftKey={DRAFT_KEY} onDone={jest.fn()} />);
    await toolsLoaded();
    expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe('');
    await press('Restore it');
    expect((screen.getByLabelText('Title') as HTMLInputElement).value).toBe('Square root along the unit circle');
    expect(screen.queryByTestId('kept-draft-notice')).toBeNull();
  });

  it('forgets the kept work once the server has saved it, and when the author discards it', async () => {
    mockFetch(201, savedVersion);
    const onDone = jest.fn();
    const first = renderWithClient(
      <SuiteForm
        initial={{
          ...badLayout(),
          cuts: [
            {
              points: [
                { re: '0', im: '0' },
                { re: '1', im: '0' },
              ],
              toInfinity: true,
            },
          ],
        }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={onDone}
      />,
    );
    await toolsLoaded();
    type('Title', 'Cube root of z(z−1), kept while typing');
    await waitFor(() => expect(keptValue()?.title).toBe('Cube root of z(z−1), kept while typing'));
    await press('Save draft');
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(window.localStorage.getItem(DRAFT_KEY)).toBeNull();
    first.unmount();

    window.localStorage.setItem(
      DRAFT_KEY,
      JSON.stringify({
        format: 1,
        savedAt: '2026-11-30T09:15:00.000Z',
        value: { ...emptySuiteDraft(), title: 'Left behind' },
      }),
    );
    renderWithClient(<SuiteForm initial={emptySuiteDraft()} editing={null} draftKey={DRAFT_KEY} onDone={jest.fn()} />);
    await toolsLoaded();
    expect(screen.getByTestId('kept-draft-notice').textContent).toMatch(/30 Nov 2026/);
    await press('Discard it');
    expect(screen.queryByTestId('kept-draft-notice')).toBeNull();
    expect(window.localStorage.getItem(DRAFT_KEY)).toBeNull();
  });

  it("offers nothing when what was kept no longer has the form's shape", async () => {
    mockFetch(201, savedVersion);
    const { paths: _paths, ...withoutPaths } = emptySuiteDraft();
    window.localStorage.setItem(
      DRAFT_KEY,
      JSON.stringify({ format: 1, savedAt: '2026-11-30T09:15:00.000Z', value: withoutPaths }),
    );
    renderWithClient(<SuiteForm initial={emptySuiteDraft()} editing={null} draftKey={DRAFT_KEY} onDone={jest.fn()} />);
    await toolsLoaded();
    expect(screen.queryByTestId('kept-draft-notice')).toBeNull();
  });
});

describe('SuiteForm on a path that checks nothing', () => {
  it('shows a radius of -1 refused beside the field, sends nothing, and names it "Path 1 · radius"', async () => {
    const calls = mockFetch(201, savedVersion);
    renderWithClient(
      <SuiteForm
        initial={{ ...emptySuiteDraft(), id: 'sqrt-circle', title: 'Square root on a circle', subject: 'sqrt(z)' }}
        editing={null}
        draftKey={DRAFT_KEY}
        onDone={jest.fn()}
      />,
    );
    await toolsLoaded();
    type('Path 1 radius', '-1');
    await waitFor(() =>
      expect(
        within(fieldOf('Path 1 radius')).getByText('× Radius must be greater than 0: with -1 the circle has no points'),
      ).toBeTruthy(),
    );
    await press('Save draft');
    const refusal = await screen.findByTestId('suite-form-refused');
    expect(refusal.textContent).toContain('Path 1 · radius: must be greater than 0');
    expect(refusal.textContent).not.toMatch(/paths\.\d/);
    expect(calls).toHaveLength(0);
  });
});
