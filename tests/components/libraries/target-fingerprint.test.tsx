import { fireEvent, screen, waitFor } from '@testing-library/react';
import { TargetFingerprint } from '../../../components/libraries/target-fingerprint';
import type { ConventionFingerprint } from '../../../shared/convention-fingerprint';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { installedTargetView } from '../../setup/installed-target-view';
import { renderWithClient } from '../../setup/render-with-client';

const fingerprint = (entry: string, behaviour: 'signed-zero' | 'counter-clockwise'): ConventionFingerprint => ({
  target: 'complex.js@2.4.1',
  entry,
  statement: `Evidence at 16 points, every value built through the ${entry} entry.`,
  missing: [],
  cuts: [{ function: 'log', cut: '(-inf, 0]', behaviour, alone: behaviour, disagreesWith: [], probes: [] }],
});

describe('TargetFingerprint', () => {
  it('offers the entries that carry a zero imaginary sign and asks for the fingerprint through the one chosen', async () => {
    fakeApiRoutes({
      'GET /api/targets': {
        status: 200,
        body: {
          targets: [
            installedTargetView('complex.js@2.4.1', [
              ['complex', 'new Complex(re, im)'],
              ['object', 'new Complex({ re, im })'],
              {
                name: 'number',
                call: 'a plain number',
                default: false,
                carries: { imaginaryPart: false, realZeroSign: true, imaginaryZeroSign: false },
              },
            ]),
          ],
        },
      },
    });
    const answered = global.fetch as jest.Mock;
    const urls: string[] = [];
    global.fetch = jest.fn(async (url: string, init?: RequestInit) => {
      urls.push(String(url));
      const response = await answered(url, init);
      const entry = /[?&]entry=([^&]+)/.exec(String(url))?.[1];
      if (!String(url).includes('/fingerprint')) return response;
      const body = {
        fingerprint: fingerprint(entry ?? 'complex', 'counter-clockwise'),
        computedMs: 5,
        fromCache: false,
      };
      return { ok: true, status: 200, text: async () => JSON.stringify(body) } as Response;
    }) as typeof fetch;
    renderWithClient(<TargetFingerprint name="complex.js@2.4.1" onOpenCutMap={() => undefined} />);
    const chips = await screen.findAllByRole('radio');
    expect(chips.map((c) => c.getAttribute('aria-label'))).toEqual([
      'Values built through: complex: new Complex(re, im)',
      'Values built through: object: new Complex({ re, im })',
    ]);
    fireEvent.click(chips[1]!);
    await waitFor(() => expect(urls.some((u) => u.endsWith('/fingerprint?entry=object'))).toBe(true));
    expect(urls.filter((u) => u.includes('/fingerprint'))[0]).not.toContain('entry=');
  });
});
