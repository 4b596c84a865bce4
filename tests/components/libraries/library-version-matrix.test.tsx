import { fireEvent, screen, waitFor } from '@testing-library/react';
import { LibraryVersionMatrix } from '../../../components/libraries/library-version-matrix';
import type { VersionMatrix } from '../../../shared/version-matrix';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { installedTargetView } from '../../setup/installed-target-view';
import { renderWithClient } from '../../setup/render-with-client';

const version = (v: string, entries: string[]) =>
  installedTargetView(
    `complex.js@${v}`,
    entries.map((name): [string, string] => [name, `${name} way`]),
  );

describe('LibraryVersionMatrix', () => {
  it('offers the entries every installed version has, and compares through the one chosen', async () => {
    fakeApiRoutes({
      'GET /api/targets': {
        status: 200,
        body: { targets: [version('2.4.1', ['complex', 'string', 'array']), version('2.4.2', ['complex', 'string'])] },
      },
      'GET /api/suites': {
        status: 200,
        body: {
          suites: [
            {
              slug: 'log-sz',
              title: 'log',
              subject: 'log(z)',
              latestVersion: 1,
              latestStatus: 'approved',
              approvedVersion: 1,
              authorName: 'Ravi Dutta',
              updatedAt: '2026-03-01T10:00:00.000Z',
            },
          ],
        },
      },
    });
    const answered = global.fetch as jest.Mock;
    const urls: string[] = [];
    global.fetch = jest.fn(async (url: string, init?: RequestInit) => {
      urls.push(String(url));
      if (!String(url).includes('/version-matrix')) return answered(url, init);
      const entry = new URL(String(url), 'http://127.0.0.1').searchParams.get('entry') ?? undefined;
      const matrix: VersionMatrix = {
        library: 'complex.js',
        versions: ['2.4.1', '2.4.2'],
        statement: 'compared',
        suites: [{ id: 'log-sz', version: 1, subject: 'log(z)', entry, statusByVersion: [], changes: [] }],
      };
      return {
        ok: true,
        status: 200,
        text: async () => JSON.stringify({ matrix, computedMs: 1, fromCache: false }),
      } as Response;
    }) as typeof fetch;
    renderWithClient(<LibraryVersionMatrix library="complex.js" />);
    await waitFor(() => expect(screen.getAllByRole('radio')).toHaveLength(3));
    expect(screen.getAllByRole('radio').map((c) => c.getAttribute('aria-label'))).toEqual([
      'Inputs built through: each suite’s own entry',
      'Inputs built through: complex: complex way',
      'Inputs built through: string: string way',
    ]);
    fireEvent.click(screen.getAllByRole('radio')[2]!);
    await waitFor(() => expect(urls.some((u) => u.includes('/version-matrix?suite=log-sz&entry=string'))).toBe(true));
    expect(urls.filter((u) => u.includes('/version-matrix'))[0]).not.toContain('entry=');
  });
});
