import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { PlanForm } from '../../../components/plans/plan-form';
import type { PlanView } from '../../../shared/plan-view';
import type { SuiteSummary } from '../../../shared/suite-summary';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const suite = (slug: string, title: string, approvedVersion: number | null): SuiteSummary => ({
  slug,
  title,
  subject: 'sqrt(z)',
  latestVersion: approvedVersion ?? 1,
  latestStatus: approvedVersion === null ? 'submitted' : 'approved',
  approvedVersion,
  authorName: 'Ravi Dutta',
  updatedAt: '2026-03-01T10:00:00.000Z',
});

const CHOICES = {
  'GET /api/suites': {
    status: 200,
    body: {
      suites: [
        suite('sqrt-principal-sz', 'Square root, signed zeros', 2),
        suite('log-principal-sz', 'Logarithm, signed zeros', 1),
        suite('acos-draft', 'Arc cosine draft', null),
      ],
    },
  },
  'GET /api/targets': {
    status: 200,
    body: {
      targets: [
        { name: 'complex.js@2.4.3', library: 'complex.js', version: '2.4.3', settings: {}, installed: true },
        { name: 'complex.js@2.0.11', library: 'complex.js', version: '2.0.11', settings: {}, installed: false },
      ],
    },
  },
};

const saved: PlanView = {
  id: '7a0c1e2d-3b4f-4a5e-8d6c-9b0a1f2e3d4c',
  name: 'Roots nightly',
  description: '',
  recipients: ['kwame@sheetkeeper.test'],
  suites: [{ slug: 'sqrt-principal-sz', title: 'Square root, signed zeros', approvedVersion: 2 }],
  targets: [{ name: 'complex.js@2.4.3', installed: true }],
  createdBy: 'Kwame Asante',
  updatedAt: '2026-03-01T10:00:00.000Z',
};

const type = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const create = () => act(() => fireEvent.click(screen.getByRole('button', { name: 'Create plan' })));

describe('PlanForm', () => {
  it('offers only approved suites and installed targets, saying how many suites wait for review', async () => {
    fakeApiRoutes(CHOICES);
    renderWithClient(<PlanForm onSaved={jest.fn()} onCancel={jest.fn()} />);
    await waitFor(() => expect(screen.getByRole('checkbox', { name: 'Square root, signed zeros' })).toBeTruthy());
    expect(screen.getByRole('checkbox', { name: 'Logarithm, signed zeros' })).toBeTruthy();
    expect(screen.queryByRole('checkbox', { name: 'Arc cosine draft' })).toBeNull();
    expect(screen.queryByRole('checkbox', { name: 'complex.js@2.0.11' })).toBeNull();
    expect(screen.getByText(/1 suite is still waiting for review/)).toBeTruthy();
  });

  it('shows every broken rule beside its field and sends nothing', async () => {
    const calls = fakeApiRoutes(CHOICES);
    renderWithClient(<PlanForm onSaved={jest.fn()} onCancel={jest.fn()} />);
    await waitFor(() => screen.getByRole('checkbox', { name: 'Square root, signed zeros' }));
    type('Name', 'ab');
    type('Recipients', 'kwame@sheetkeeper.test, nobody-at-all');
    await create();
    expect(screen.getByText('× Name must be at least 3 characters')).toBeTruthy();
    expect(screen.getByText('× Recipients “nobody-at-all” must be an e-mail address')).toBeTruthy();
    expect(screen.getByText('× Suites needs at least one suite')).toBeTruthy();
    expect(screen.getByText('× Targets needs at least one target')).toBeTruthy();
    expect(calls.filter((c) => c.method !== 'GET')).toEqual([]);

    // Fixing a field clears its rule at once.
    await act(() => fireEvent.click(screen.getByRole('checkbox', { name: 'Square root, signed zeros' })));
    expect(screen.queryByText(/× Suites/)).toBeNull();
    expect(screen.getByRole('checkbox', { name: 'Square root, signed zeros' }).getAttribute('aria-checked')).toBe(
      'true',
    );
  });

  it("puts the server's refusal of a suite beside the suites and keeps everything typed", async () => {
    const calls = fakeApiRoutes({
      ...CHOICES,
      'POST /api/plans': {
        status: 400,
        body: {
          kind: 'invalid-input',
          message: 'invalid input',
          issues: [{ field: 'body.suites.0', rule: 'has no approved version yet ("log-principal-sz")' }],
        },
      },
    });
    const onSaved = jest.fn();
    renderWithClient(<PlanForm onSaved={onSaved} onCancel={jest.fn()} />);
    await waitFor(() => screen.getByRole('checkbox', { name: 'Logarithm, signed zeros' }));
    type('Name', 'Logs nightly');
    type('Description', 'Every log suite');
    type('Recipients', 'kwame@sheetkeeper.test');
    await act(() => fireEvent.click(screen.getByRole('checkbox', { name: 'Logarithm, signed zeros' })));
    await act(() => fireEvent.click(screen.getByRole('checkbox', { name: 'complex.js@2.4.3' })));
    await create();
    await waitFor(() =>
      expect(screen.getByText('× Suites has no approved version yet ("log-principal-sz")')).toBeTruthy(),
    );
    expect(calls.find((c) => c.method === 'POST')!.body).toEqual({
      name: 'Logs nightly',
      description: 'Every log suite',
      recipients: ['kwame@sheetkeeper.test'],
      suites: ['log-principal-sz'],
      targets: ['complex.js@2.4.3'],
    });
    expect((screen.getByLabelText('Name') as HTMLInputElement).value).toBe('Logs nightly');
    expect((screen.getByLabelText('Description') as HTMLInputElement).value).toBe('Every log suite');
    expect(screen.getByRole('checkbox', { name: 'Logarithm, signed zeros' }).getAttribute('aria-checked')).toBe('true');
    expect(onSaved).not.toHaveBeenCalled();
  });

  it('replaces an existing plan with PUT and hands back the saved plan', async () => {
    const calls = fakeApiRoutes({
      ...CHOICES,
      [`PUT /api/plans/${saved.id}`]: { status: 200, body: { plan: { ...saved, name: 'Roots every night' } } },
    });
    const onSaved = jest.fn();
    renderWithClient(<PlanForm plan={saved} onSaved={onSaved} onCancel={jest.fn()} />);
    await waitFor(() => screen.getByRole('checkbox', { name: 'Square root, signed zeros' }));
    expect(screen.getByRole('checkbox', { name: 'Square root, signed zeros' }).getAttribute('aria-checked')).toBe(
      'true',
    );
    type('Name', 'Roots every night');
    await act(() => fireEvent.click(screen.getByRole('button', { name: 'Save plan' })));
    await waitFor(() => expect(onSaved).toHaveBeenCalledWith(expect.objectContaining({ name: 'Roots every night' })));
    expect(calls.find((c) => c.method === 'PUT')!.body).toEqual({
      name: 'Roots every night',
      description: '',
      recipients: ['kwame@sheetkeeper.test'],
      suites: ['sqrt-principal-sz'],
      targets: ['complex.js@2.4.3'],
    });
  });
});
