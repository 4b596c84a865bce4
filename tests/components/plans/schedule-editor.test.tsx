import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { ScheduleEditor } from '../../../components/plans/schedule-editor';
import type { ScheduleView } from '../../../shared/schedule-view';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const PLAN = '6f1d7a52-0c1e-4b7e-9f5a-2d3c4b5a6e7f';
const schedule: ScheduleView = {
  id: 'a1f0c7e2-5b1d-4c3e-8f9a-0b1c2d3e4f50',
  planId: PLAN,
  planName: 'complex.js nightly',
  cron: '30 2 * * *',
  timeZone: 'UTC',
  enabled: true,
  nextRuns: [],
};

/** The server's rules for the expressions the tests type that it refuses. */
const REFUSED: Record<string, string> = {
  '0 25 * * *': 'has an invalid hour field: "25"',
  '*/5 * * * *': 'must leave at least 15 min between runs (this one runs 5 min apart)',
};

/** The server's preview, computed here only for the expressions the tests type. */
const preview = (body: unknown) => {
  const { cron } = body as { cron: string };
  const rule = REFUSED[cron];
  if (rule)
    return {
      status: 400,
      body: { kind: 'invalid-input', message: 'invalid input', issues: [{ field: 'body.cron', rule }] },
    };
  if (cron === '15 6 * * 1')
    return {
      status: 200,
      body: { nextRuns: ['2031-03-03T06:15:00.000Z', '2031-03-10T06:15:00.000Z', '2031-03-17T06:15:00.000Z'] },
    };
  return {
    status: 200,
    body: { nextRuns: ['2031-03-01T02:30:00.000Z', '2031-03-02T02:30:00.000Z', '2031-03-03T02:30:00.000Z'] },
  };
};

const type = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });

describe('ScheduleEditor', () => {
  beforeEach(() => jest.useFakeTimers());
  afterEach(() => jest.useRealTimers());
  const settle = () => act(() => jest.advanceTimersByTime(400));

  it('shows the next three times for the expression as typed, in the chosen time zone', async () => {
    const calls = fakeApiRoutes({ 'POST /api/schedules/preview': preview });
    renderWithClient(<ScheduleEditor planId={PLAN} schedule={schedule} onDone={jest.fn()} />);
    await settle();
    await waitFor(() => expect(screen.getByText('Sat 1 Mar 2031, 02:30')).toBeTruthy());
    type('Cron expression', '15 6 * * 1');
    await settle();
    await waitFor(() => expect(screen.getByText('Mon 3 Mar 2031, 06:15')).toBeTruthy());
    expect(screen.getByText('Mon 10 Mar 2031, 06:15')).toBeTruthy();
    expect(screen.getByText('Mon 17 Mar 2031, 06:15')).toBeTruthy();
    expect(screen.queryByText(/2031, 02:30/)).toBeNull();
    expect(calls.filter((c) => c.path === '/api/schedules/preview').map((c) => c.body)).toEqual([
      { cron: '30 2 * * *', timeZone: 'UTC' },
      { cron: '15 6 * * 1', timeZone: 'UTC' },
    ]);
  });

  it("puts the server's rule for a bad field beside the cron field and shows no times", async () => {
    fakeApiRoutes({ 'POST /api/schedules/preview': preview });
    renderWithClient(<ScheduleEditor planId={PLAN} schedule={schedule} onDone={jest.fn()} />);
    type('Cron expression', '0 25 * * *');
    await settle();
    await waitFor(() => expect(screen.getByText('× Cron expression has an invalid hour field: "25"')).toBeTruthy());
    expect(screen.getByLabelText('Cron expression').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('— no times until the expression is valid')).toBeTruthy();
  });

  it('states the minimum time between runs, and shows the server refusing a schedule that runs more often', async () => {
    fakeApiRoutes({ 'POST /api/schedules/preview': preview });
    renderWithClient(<ScheduleEditor planId={PLAN} schedule={schedule} onDone={jest.fn()} />);
    expect(screen.getByText(/Runs must be at least 15 minutes apart; use Run now for anything sooner\./)).toBeTruthy();
    type('Cron expression', '*/5 * * * *');
    await settle();
    await waitFor(() =>
      expect(
        screen.getByText('× Cron expression must leave at least 15 min between runs (this one runs 5 min apart)'),
      ).toBeTruthy(),
    );
    expect(screen.getByText('— no times until the expression is valid')).toBeTruthy();
  });

  it('checks the shared schema before asking the server, so a too-short expression is never sent', async () => {
    const calls = fakeApiRoutes({ 'POST /api/schedules/preview': preview });
    renderWithClient(<ScheduleEditor planId={PLAN} schedule={schedule} onDone={jest.fn()} />);
    await settle();
    type('Cron expression', '* *');
    await settle();
    expect(screen.getByText('× Cron expression must have 5 or 6 fields')).toBeTruthy();
    expect(calls.filter((c) => c.body && (c.body as { cron: string }).cron === '* *')).toEqual([]);
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Save schedule' })));
    expect(calls.some((c) => c.method === 'PATCH')).toBe(false);
  });

  it('keeps what was typed and shows the rule beside the field when saving is refused', async () => {
    const calls = fakeApiRoutes({
      'POST /api/schedules/preview': preview,
      [`PATCH /api/schedules/${schedule.id}`]: {
        status: 400,
        body: {
          kind: 'invalid-input',
          message: 'invalid input',
          issues: [{ field: 'body.timeZone', rule: 'must be a time zone name such as Europe/Oslo or UTC' }],
        },
      },
    });
    const onDone = jest.fn();
    renderWithClient(<ScheduleEditor planId={PLAN} schedule={schedule} onDone={onDone} />);
    type('Cron expression', '15 6 * * 1');
    await settle();
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Save schedule' })));
    await waitFor(() =>
      expect(screen.getByText('× Time zone must be a time zone name such as Europe/Oslo or UTC')).toBeTruthy(),
    );
    expect((screen.getByLabelText('Cron expression') as HTMLInputElement).value).toBe('15 6 * * 1');
    expect(calls.find((c) => c.method === 'PATCH')!.body).toEqual({ cron: '15 6 * * 1', timeZone: 'UTC' });
    expect(onDone).not.toHaveBeenCalled();
  });

  it('creates a schedule for the plan, switched on', async () => {
    const created: ScheduleView = { ...schedule, cron: '15 6 * * 1', nextRuns: [] };
    const calls = fakeApiRoutes({
      'POST /api/schedules/preview': preview,
      'POST /api/schedules': { status: 201, body: { schedule: created } },
    });
    const onDone = jest.fn();
    renderWithClient(<ScheduleEditor planId={PLAN} onDone={onDone} />);
    type('Cron expression', '15 6 * * 1');
    type('Time zone', 'UTC');
    await settle();
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Add schedule' })));
    await waitFor(() => expect(onDone).toHaveBeenCalled());
    expect(calls.find((c) => c.path === '/api/schedules')!.body).toEqual({
      planId: PLAN,
      cron: '15 6 * * 1',
      timeZone: 'UTC',
      enabled: true,
    });
  });
});
