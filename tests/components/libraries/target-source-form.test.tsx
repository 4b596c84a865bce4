import { act, fireEvent, screen, waitFor } from '@testing-library/react';
import { TargetSourceForm } from '../../../components/libraries/target-source-form';
import { STORABLE_TEXT_RULE } from '../../../shared/schemas/text-schema';
import type { TargetSourceView } from '../../../shared/target-source-view';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const type = (label: string, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
const choose = (kind: string) =>
  act(() => fireEvent.click(screen.getByRole('radio', { name: `Kind of target: ${kind}` })));
const add = () => act(() => fireEvent.click(screen.getByRole('button', { name: 'Add target' })));
const errorText = () => screen.getByTestId('target-source-form').textContent ?? '';

const accepted = (source: unknown): TargetSourceView => ({
  id: '2f1c3a4b-5d6e-4f70-8a9b-0c1d2e3f4a5b',
  source: source as TargetSourceView['source'],
  state: 'resolving',
  targetNames: [],
  error: null,
  addedBy: 'Odile',
  addedAt: '2026-12-05T06:00:00.000Z',
  resolvedAt: null,
});

describe('TargetSourceForm', () => {
  it('names what is wrong beside each field as it is typed, with the rules the server applies', async () => {
    const calls = fakeApiRoutes({});
    renderWithClient(<TargetSourceForm />);
    type('Package', 'Complex.JS');
    expect(errorText()).toContain('Package must be an npm package name such as complex.js');
    type('Exact version', '^2.4.0');
    expect(errorText()).toContain('Exact version must be an exact version such as 2.4.3 (no ranges or tags)');
    type('Package', 'complex.js');
    type('Exact version', '2.4.3');
    expect(errorText()).not.toMatch(/must be/);

    await choose('Program (any language)');
    type('Command and arguments', 'python3 bad\ud800.py');
    expect(errorText()).toContain(`Command and arguments ${STORABLE_TEXT_RULE}`);
    expect(calls).toEqual([]);
  });

  it('marks every empty field on a premature add, and sends nothing', async () => {
    const calls = fakeApiRoutes({});
    renderWithClient(<TargetSourceForm />);
    await choose('Folder or tarball on the server');
    expect(screen.getByText(/only admins may add one/)).toBeTruthy();
    await add();
    expect(errorText()).toContain('Path on the server must not be empty');
    expect(calls).toEqual([]);
  });

  it('sends a program as its argument list, then empties the fields for the next one', async () => {
    const calls = fakeApiRoutes({
      'POST /api/target-sources': (body) => ({ status: 202, body: { source: accepted(body) } }),
    });
    renderWithClient(<TargetSourceForm />);
    await choose('Program (any language)');
    type('Command and arguments', '  /usr/bin/python3   adapters/my_adapter.py ');
    type('Target name (optional)', 'mine@main');
    await add();
    await waitFor(() => expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1));
    expect(calls[0]).toEqual({
      method: 'POST',
      path: '/api/target-sources',
      body: { kind: 'program', command: ['/usr/bin/python3', 'adapters/my_adapter.py'], name: 'mine@main' },
    });
    await waitFor(() => expect((screen.getByLabelText('Command and arguments') as HTMLInputElement).value).toBe(''));
  });

  it("shows the server's refusals: a field's beside it, a conflict as a plain sentence", async () => {
    let answer = 0;
    fakeApiRoutes({
      'POST /api/target-sources': () =>
        answer++ === 0
          ? {
              status: 400,
              body: {
                kind: 'invalid-input',
                message: 'invalid',
                issues: [{ field: 'body.version', rule: 'is not published on npm' }],
              },
            }
          : { status: 409, body: { kind: 'conflict', message: 'This source is added already: see the list below.' } },
    });
    renderWithClient(<TargetSourceForm />);
    type('Package', 'complex.js');
    type('Exact version', '9.9.9');
    await add();
    await waitFor(() => expect(errorText()).toContain('Exact version is not published on npm'));
    await add();
    await waitFor(() => expect(screen.getByRole('alert').textContent).toContain('This source is added already'));
  });
});
