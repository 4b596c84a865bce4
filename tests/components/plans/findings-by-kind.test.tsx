import { screen, within } from '@testing-library/react';
import { FindingsByKind } from '../../../components/plans/findings-by-kind';
import { theme } from '../../../constants/theme';
import type { DiagnosisKind } from '../../../shared/diagnosis';
import { DIAGNOSIS_KINDS } from '../../../shared/diagnosis-kinds';
import type { FindingsByKindView } from '../../../shared/findings-by-kind-view';
import { mockFetch } from '../../setup/mock-fetch';
import { renderWithClient } from '../../setup/render-with-client';
import { setScreenWidth } from '../../setup/set-screen-width';

jest.mock('expo-router', () => require('../../setup/expo-router-stub'));

const PLAN = 'a1b2c3d4-0000-4000-8000-000000000001';
const FIRST = '11111111-1111-4111-8111-111111111111';
const SECOND = '22222222-2222-4222-8222-222222222222';
const counts = (over: Partial<Record<DiagnosisKind, number>>) =>
  ({ ...Object.fromEntries(DIAGNOSIS_KINDS.map((k) => [k, 0])), ...over }) as Record<DiagnosisKind, number>;
// The demo nightly plan's story: 2.3.0 had a few inaccurate values; 2.4.x adds 31 ignored zero signs.
const VIEW: FindingsByKindView = {
  runs: [
    {
      id: FIRST,
      createdAt: '2026-12-03T02:30:00Z',
      finishedAt: '2026-12-03T02:31:00Z',
      failed: 20,
      checksStopped: 0,
      byKind: counts({ inaccurate: 20 }),
    },
    {
      id: SECOND,
      createdAt: '2026-12-04T02:30:00Z',
      finishedAt: '2026-12-04T02:31:00Z',
      failed: 52,
      checksStopped: 0,
      byKind: counts({ 'zero-sign': 31, 'cut-side': 2, inaccurate: 20 }),
    },
  ],
  limit: 12,
};

describe.each([390, 1440])('FindingsByKind at %i px', (width) => {
  beforeEach(() => setScreenWidth(width));

  it('asks for the latest twelve completed runs of the plan', async () => {
    const calls = mockFetch(200, VIEW);
    renderWithClient(<FindingsByKind planId={PLAN} />);
    await screen.findByText('Branch findings');
    expect(calls[0]!.url).toBe(`/api/plans/${PLAN}/findings-by-kind?runs=12`);
  });

  it('lists branch kinds first in their order, then accuracy, with every count in words', async () => {
    mockFetch(200, VIEW);
    renderWithClient(<FindingsByKind planId={PLAN} />);
    const names = (await screen.findAllByLabelText(/, oldest run first: /)).map((e) => e.getAttribute('aria-label'));
    expect(names).toEqual([
      'wrong side of a cut, oldest run first: 0, 2',
      'ignored zero sign, oldest run first: 0, 31',
      'inaccurate, oldest run first: 20, 20',
    ]);
    const panel = screen.getByTestId('findings-by-kind');
    const text = panel.textContent!;
    expect(text.indexOf('Branch findings')).toBeLessThan(text.indexOf('Accuracy findings'));
    expect(text).toContain('None in these runs: other sheet, misplaced cut, not finite, disagreement, unexplained.');
  });

  it("links each bar to that run's failures of that kind and each date to the run", async () => {
    mockFetch(200, VIEW);
    renderWithClient(<FindingsByKind planId={PLAN} />);
    const bar = await screen.findByRole('link', {
      name: /^31 ignored zero sign in the run of .*: open these failures$/,
    });
    expect(bar.getAttribute('href')).toBe(`/failures?run=${SECOND}&diagnosis=zero-sign`);
    expect(within(bar).getByText('31')).toBeTruthy();
    const older = screen.getByRole('link', { name: /^20 inaccurate in the run of 3 Dec 2026/ });
    expect(older.getAttribute('href')).toBe(`/failures?run=${FIRST}&diagnosis=inaccurate`);
    expect(screen.getByRole('link', { name: /^Run of 4 Dec \d\d:\d\d: 52 failing points$/ }).getAttribute('href')).toBe(
      `/runs/${SECOND}`,
    );
    // A run without a kind has no bar to follow, but says so.
    expect(screen.queryByRole('link', { name: /^0 / })).toBeNull();
    expect(screen.getAllByLabelText(/^No ignored zero sign in the run of 3 Dec 2026/)).toHaveLength(1);
  });

  it('names every link with the words it shows, and more (WCAG 2.5.3, label in name)', async () => {
    mockFetch(200, VIEW);
    renderWithClient(<FindingsByKind planId={PLAN} />);
    await screen.findByText('Branch findings');
    const links = within(screen.getByTestId('findings-by-kind')).getAllByRole('link');
    expect(links).toHaveLength(2 + 4);
    for (const link of links) {
      const shown = link.textContent!.replace(/\s+/g, ' ').trim();
      expect({ shown, within: link.getAttribute('aria-label')!.includes(shown) }).toEqual({ shown, within: true });
    }
  });

  it("draws each bar in its kind's ink, to its row's scale", async () => {
    mockFetch(200, VIEW);
    renderWithClient(<FindingsByKind planId={PLAN} />);
    const bar = await screen.findByRole('link', { name: /^2 wrong side of a cut/ });
    const fill = bar.querySelector('[style*="height"]') as HTMLElement;
    expect(fill.style.height).toBe('40px');
    const toRgb = (hex: string) => `rgb(${[1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16)).join(', ')})`;
    expect(fill.style.backgroundColor).toBe(toRgb(theme.kindInk['cut-side']));
  });

  it('names the checks stopped by an error in each run as counting nothing, in the words of the run verdict', async () => {
    const second = { ...VIEW.runs[1]!, checksStopped: 2 };
    mockFetch(200, { ...VIEW, runs: [VIEW.runs[0], second] });
    renderWithClient(<FindingsByKind planId={PLAN} />);
    const note = await screen.findByTestId('findings-by-kind-stopped');
    expect(note.textContent).toMatch(
      /^Not counted here, as they checked nothing: 2 checks stopped by an error in the run of 4 Dec \d\d:\d\d\.$/,
    );
    expect(
      screen.getByRole('link', { name: /^Run of 4 Dec \d\d:\d\d: 52 failing points, 2 checks stopped by an error$/ }),
    ).toBeTruthy();
    expect(screen.getByRole('link', { name: /^Run of 3 Dec \d\d:\d\d: 20 failing points$/ })).toBeTruthy();
  });

  it('says no findings beside the checks that checked nothing, never alone', async () => {
    mockFetch(200, { runs: [{ ...VIEW.runs[0]!, failed: 0, checksStopped: 1, byKind: counts({}) }], limit: 12 });
    renderWithClient(<FindingsByKind planId={PLAN} />);
    expect(await screen.findByText('No findings in its completed run.')).toBeTruthy();
    expect(screen.getByTestId('findings-by-kind-stopped').textContent).toMatch(/: 1 check stopped by an error in /);
  });

  it('says plainly when the plan has no completed run, or no findings', async () => {
    mockFetch(200, { runs: [], limit: 12 });
    const { unmount } = renderWithClient(<FindingsByKind planId={PLAN} />);
    expect(await screen.findByText(/No completed run of this plan yet/)).toBeTruthy();
    unmount();
    mockFetch(200, { runs: [{ ...VIEW.runs[0]!, failed: 0, byKind: counts({}) }], limit: 12 });
    renderWithClient(<FindingsByKind planId={PLAN} />);
    expect(await screen.findByText('No findings in its completed run.')).toBeTruthy();
  });
});
