import { screen } from '@testing-library/react';
import { TargetList } from '../../../components/libraries/target-list';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { installedTargetView } from '../../setup/installed-target-view';
import { renderWithClient } from '../../setup/render-with-client';

describe('TargetList', () => {
  it('lists the entries of an installed target, the default marked, and nothing for one recorded before entries', async () => {
    fakeApiRoutes({
      'GET /api/targets': {
        status: 200,
        body: {
          targets: [
            {
              ...installedTargetView('complex.js@2.4.1', [
                ['complex', 'new Complex(re, im)'],
                ['string', 'new Complex("re±im i")'],
              ]),
              settings: { package: 'complex.js-2.4.1' },
            },
            { name: 'complex.js@2.0.11', library: 'complex.js', version: '2.0.11', settings: {}, installed: false },
          ],
        },
      },
    });
    renderWithClient(<TargetList onOpenTarget={() => undefined} onOpenMatrix={() => undefined} />);
    const card = await screen.findByTestId('library-complex.js');
    expect(card.textContent).toContain(
      'Values go in through: complex (new Complex(re, im), the default) · string (new Complex("re±im i"))',
    );
    expect(card.textContent?.match(/Values go in through/g)).toHaveLength(1);
    expect(card.textContent).not.toContain('States');
  });

  it('says which convention a target states on its cuts and what that spares it', async () => {
    fakeApiRoutes({
      'GET /api/targets': {
        status: 200,
        body: {
          targets: [
            {
              ...installedTargetView('glibc@2.36', [['cmplx', 'CMPLX(re, im)']]),
              library: 'glibc',
              version: '2.36',
              convention: 'signed-zero',
            },
          ],
        },
      },
    });
    renderWithClient(<TargetList onOpenTarget={() => undefined} onOpenMatrix={() => undefined} />);
    const card = await screen.findByTestId('library-glibc');
    expect(card.textContent).toContain(
      'States signed zeros on its cuts (ISO C Annex G): counter-clockwise suites skip the points where the two conventions differ.',
    );
  });
});
