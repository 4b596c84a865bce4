import { fireEvent, render, screen, within } from '@testing-library/react';
import { RunMatrix } from '../../../components/runs/run-matrix';
import type { RunMatrixCell } from '../../../shared/run-matrix-cell';
import { setScreenWidth } from '../../setup/set-screen-width';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const RUN = '7d3f9a52-1c4e-4b8a-9f10-2a6c5e8d4b31';
const scope = {
  convention: 'signed-zero',
  branch: 'principal',
  tolerance: '4 ulps',
  paths: 3,
  points: 123,
  properties: { listed: [], run: true, note: '' },
};

const cell = (over: Partial<RunMatrixCell>): RunMatrixCell => ({
  suite: 'sqrt-principal-sz',
  target: 'complex.js@2.4.3',
  status: 'done',
  outcome: 'pass',
  counts: { pass: 120, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
  byClass: { branch: 0, accuracy: 0 },
  byDiagnosis: {},
  checked: scope,
  errors: [],
  skipReasons: [],
  worker: null,
  noWorkerHasTarget: false,
  lawsFailed: 0,
  loopsFailed: [],
  ...over,
});

const CELLS: RunMatrixCell[] = [
  cell({}),
  cell({
    target: 'complex.js@2.4.2',
    outcome: 'fail',
    counts: { pass: 117, fail: 3, error: 0, skipped: 4, notApplicable: 0 },
    byClass: { branch: 3, accuracy: 0 },
    byDiagnosis: { 'other-sheet': 2, 'cut-side': 1 },
  }),
  cell({
    suite: 'log-principal-sz',
    target: 'complex.js@2.4.3',
    outcome: 'error',
    counts: null,
    byClass: null,
    byDiagnosis: null,
    checked: null,
    errors: ['The target did not answer within 30 s.'],
  }),
  cell({
    suite: 'log-principal-sz',
    target: 'complex.js@2.4.2',
    outcome: 'error',
    counts: { pass: 80, fail: 0, error: 2, skipped: 0, notApplicable: 0 },
    byDiagnosis: {},
    errors: ['path "circle r=2" threw: RangeError'],
  }),
  cell({
    suite: 'acos-principal-sz',
    target: 'complex.js@2.4.3',
    status: 'running',
    outcome: null,
    counts: null,
    byClass: null,
    byDiagnosis: null,
    checked: null,
  }),
  cell({ suite: 'acos-principal-sz', target: 'complex.js@2.4.2' }),
];

/** The cells above and a suite that passed on both targets. */
const WITH_PASSING_SUITE: RunMatrixCell[] = [
  ...CELLS,
  cell({ suite: 'exp-principal-sz' }),
  cell({ suite: 'exp-principal-sz', target: 'complex.js@2.4.2' }),
];

const cellOf = (suite: string, target: string) => screen.getByTestId(`cell-${suite}-${target}`);
/** Whether a cell shows `text`: a line of its own on a wide screen, part of one paragraph of details on a phone. */
const shows = (cell: HTMLElement, text: string) => (cell.textContent ?? '').includes(text);
const times = (cell: HTMLElement, text: string) => (cell.textContent ?? '').split(text).length - 1;

describe.each([
  ['phone', 390],
  ['wide screen', 1440],
])('RunMatrix on a %s', (_name, width) => {
  beforeEach(() => setScreenWidth(width));

  it('says each outcome in glyphs and words, not only in colour', () => {
    render(<RunMatrix runId={RUN} cells={CELLS} />);
    expect(within(cellOf('sqrt-principal-sz', 'complex.js@2.4.3')).getByText('✓ 120')).toBeTruthy();
    const failing = cellOf('sqrt-principal-sz', 'complex.js@2.4.2');
    expect(shows(failing, '❌ 3 · 3 branch')).toBe(true);
    expect(shows(failing, '2 other sheet')).toBe(true);
    expect(shows(failing, '1 wrong side of a cut')).toBe(true);
    expect(shows(failing, '✓ 117 passed')).toBe(true);
    expect(shows(failing, '− 4 skipped')).toBe(true);
    // Named by its words, led by the sentence a screen reader reads first (WCAG 2.5.3, label in name).
    expect(failing.getAttribute('aria-label')).toBeNull();
    expect(failing.textContent).toMatch(
      /^sqrt-principal-sz on complex\.js@2\.4\.2: 3 failed: 3 branch findings, 2 other sheet, 1 wrong side of a cut, 117 passed, 4 skipped\. Open these failures\. /,
    );
    expect(within(cellOf('acos-principal-sz', 'complex.js@2.4.3')).getByText('↻ running now')).toBeTruthy();
  });

  it('leads with branch findings even where accuracy findings are many more, and counts points not applicable to the entry', () => {
    const mixed = cell({
      suite: 'asin-principal-sz',
      outcome: 'fail',
      counts: { pass: 100, fail: 42, error: 0, skipped: 0, notApplicable: 6 },
      byClass: { branch: 2, accuracy: 40 },
      byDiagnosis: { inaccurate: 40, 'zero-sign': 2 },
    });
    render(<RunMatrix runId={RUN} cells={[mixed]} />);
    const only = cellOf('asin-principal-sz', 'complex.js@2.4.3');
    expect(shows(only, '❌ 42 · 2 branch · 40 accuracy')).toBe(true);
    const text = only.textContent ?? '';
    const at = ['2 ignored zero sign', '40 inaccurate', '– 6 not applicable'].map((line) => text.indexOf(line));
    expect(at.every((i) => i >= 0)).toBe(true);
    expect([...at].sort((a, b) => a - b)).toEqual(at);
    expect(only.textContent).toMatch(
      /^asin-principal-sz on complex\.js@2\.4\.3: 42 failed: 2 branch findings, 40 accuracy findings, 2 ignored zero sign, 40 inaccurate, 100 passed, 6 not applicable to the entry\. Open these failures\. /,
    );
  });

  it('says "nothing was checked" for an error cell that checked no point, with the error', () => {
    render(<RunMatrix runId={RUN} cells={CELLS} />);
    const nothing = cellOf('log-principal-sz', 'complex.js@2.4.3');
    expect(shows(nothing, '◊ error')).toBe(true);
    expect(shows(nothing, 'nothing was checked')).toBe(true);
    expect(shows(nothing, 'The target did not answer within 30 s.')).toBe(true);
    const partly = cellOf('log-principal-sz', 'complex.js@2.4.2');
    expect(shows(partly, '◊ 2 errors')).toBe(true);
    expect(shows(partly, '✓ 80 passed')).toBe(true);
    expect(shows(partly, 'nothing was checked')).toBe(false);
  });

  it('says "nothing was checked" once when every point was skipped and the shard says so itself', () => {
    const skipped = cell({
      suite: 'cbrt-principal-sz',
      outcome: 'error',
      counts: { pass: 0, fail: 0, error: 0, skipped: 154, notApplicable: 0 },
      byDiagnosis: {},
      errors: ['nothing was checked: every point was skipped (see the reasons per path)'],
    });
    render(<RunMatrix runId={RUN} cells={[skipped]} />);
    const only = cellOf('cbrt-principal-sz', 'complex.js@2.4.3');
    expect(times(only, 'nothing was checked')).toBe(1);
    expect(shows(only, '− 154 skipped')).toBe(true);
    // Skipped points are counted, never rows of the failure table: a link there would open an empty table.
    expect(only.getAttribute('href')).toBeNull();
  });

  it('says why a check whose target lacks the function checked nothing, and leads to the page of that target', () => {
    const lacking = cell({
      suite: 'acsch-principal-sz',
      outcome: 'error',
      counts: { pass: 0, fail: 0, error: 0, skipped: 154, notApplicable: 0 },
      byDiagnosis: {},
      errors: [
        'nothing was checked: every point was skipped or not applicable to the entry (see the reasons per path)',
      ],
      skipReasons: [{ reason: 'complex.js@2.4.3 has no acsch', count: 154, lacks: ['acsch'] }],
    });
    render(<RunMatrix runId={RUN} cells={[lacking]} />);
    const only = cellOf('acsch-principal-sz', 'complex.js@2.4.3');
    expect(shows(only, '− 154 skipped: complex.js@2.4.3 has no acsch')).toBe(true);
    expect(shows(only, 'what complex.js@2.4.3 has →')).toBe(true);
    expect(only.getAttribute('href')).toBe('/libraries/target?name=complex.js%402.4.3');
  });

  it('links a cell with failures or errors to the failure table filtered by run, suite and target; a passing cell is no link', () => {
    render(<RunMatrix runId={RUN} cells={CELLS} />);
    expect(cellOf('sqrt-principal-sz', 'complex.js@2.4.2').getAttribute('href')).toBe(
      `/failures?run=${RUN}&suite=sqrt-principal-sz&target=complex.js%402.4.2`,
    );
    expect(cellOf('log-principal-sz', 'complex.js@2.4.2').getAttribute('href')).toBe(
      `/failures?run=${RUN}&suite=log-principal-sz&target=complex.js%402.4.2`,
    );
    expect(cellOf('sqrt-principal-sz', 'complex.js@2.4.3').getAttribute('href')).toBeNull();
    expect(cellOf('log-principal-sz', 'complex.js@2.4.3').getAttribute('href')).toBeNull();
  });

  it('counts the checks by outcome, errors by the same rule as the cells', () => {
    render(
      <RunMatrix
        runId={RUN}
        cells={[
          ...CELLS,
          cell({ suite: 'exp-principal-sz' }),
          cell({ suite: 'exp-principal-sz', target: 'complex.js@2.4.2' }),
        ]}
      />,
    );
    expect(screen.getByTestId('matrix-summary').textContent).toBe(
      '8 checks (4 suites × 2 library versions): ✓ 4 passed · ❌ 1 with failures · ◊ 2 stopped by an error · 1 not finished or cancelled',
    );
  });
});

it('can hide the suites that passed everywhere on a wide screen', () => {
  setScreenWidth(1440);
  render(<RunMatrix runId={RUN} cells={WITH_PASSING_SUITE} />);
  expect(screen.queryByText('exp-principal-sz')).not.toBeNull();
  fireEvent.click(screen.getByRole('switch', { name: 'Show only suites that need a look' }));
  expect(screen.queryByText('exp-principal-sz')).toBeNull();
  expect(screen.getByText('sqrt-principal-sz')).toBeTruthy();
  expect(screen.getByRole('switch', { name: 'Show only suites that need a look' }).getAttribute('aria-checked')).toBe(
    'true',
  );
});

it('shows a phone the suites that need a look first, with their passing checks one line each, and folds the rest', () => {
  setScreenWidth(390);
  render(<RunMatrix runId={RUN} cells={WITH_PASSING_SUITE} />);
  const headers = screen.getAllByRole('heading').map((h) => h.textContent);
  expect(headers).toEqual(['acos-principal-sz', 'log-principal-sz', 'sqrt-principal-sz']);
  // A passing check in a card that needs a look: its outcome only, no detail lines.
  const passing = cellOf('sqrt-principal-sz', 'complex.js@2.4.3');
  expect(passing.textContent).toBe('complex.js@2.4.3✓ 120');
  // Its name holds its visible words, and no ↑ or ↓: those are counts that went up or down.
  const fold = screen.getByRole('button', { name: '1 suite passed on every library version: show it' });
  expect(fold.textContent).toBe('✓ 1 suite passed on every library version: show it');
  expect(fold.getAttribute('aria-expanded')).toBe('false');
  fireEvent.click(fold);
  expect(screen.getByText('exp-principal-sz')).toBeTruthy();
  const hide = screen.getByRole('button', { name: '1 suite passed on every library version: hide it' });
  expect(hide.getAttribute('aria-expanded')).toBe('true');
  expect(hide.textContent).not.toMatch(/[↑↓]/);
});

it('lays the matrix out as a grid with a column per target on a wide screen, and as cards on a phone', () => {
  setScreenWidth(1440);
  const { unmount } = render(<RunMatrix runId={RUN} cells={CELLS} />);
  expect(screen.getAllByRole('columnheader').map((h) => h.textContent)).toEqual([
    'Suites in rows, library versions in columns',
    'complex.js@2.4.2',
    'complex.js@2.4.3',
  ]);
  // The grid gives each detail its own line; a phone one paragraph (below).
  const wideCell = cellOf('sqrt-principal-sz', 'complex.js@2.4.2');
  for (const line of ['2 other sheet', '1 wrong side of a cut', '✓ 117 passed', '− 4 skipped'])
    expect(within(wideCell).getByText(line)).toBeTruthy();
  unmount();
  setScreenWidth(390);
  render(<RunMatrix runId={RUN} cells={CELLS} />);
  expect(screen.queryAllByRole('columnheader')).toHaveLength(0);
  // Each card names its target beside the outcome, since there is no column header.
  expect(within(cellOf('sqrt-principal-sz', 'complex.js@2.4.2')).getByText('complex.js@2.4.2')).toBeTruthy();
  expect(
    within(cellOf('sqrt-principal-sz', 'complex.js@2.4.2')).getByText(
      '2 other sheet · 1 wrong side of a cut · ✓ 117 passed · − 4 skipped',
    ),
  ).toBeTruthy();
});

it("gives a wide screen's cell its outcome and link on one line and its details as one paragraph of their own words", () => {
  setScreenWidth(1440);
  render(<RunMatrix runId={RUN} cells={CELLS} />);
  const failing = cellOf('sqrt-principal-sz', 'complex.js@2.4.2');
  const outcomeLine = within(failing).getByText('❌ 3 · 3 branch').parentElement!;
  expect(within(outcomeLine).getByText('failures →')).toBeTruthy();
  const paragraph = within(failing).getByText('2 other sheet').parentElement!;
  expect(paragraph.textContent).toBe('2 other sheet · 1 wrong side of a cut · ✓ 117 passed · − 4 skipped');
});

it('shows every failing and errored check of a wide matrix without a tap, beside the suites that passed', () => {
  setScreenWidth(1440);
  render(<RunMatrix runId={RUN} cells={WITH_PASSING_SUITE} />);
  const needing = WITH_PASSING_SUITE.filter((c) => c.outcome === 'fail' || c.outcome === 'error');
  expect(needing).toHaveLength(3);
  for (const c of needing) expect(cellOf(c.suite, c.target)).toBeTruthy();
  expect(screen.queryAllByRole('button')).toHaveLength(0);
});
