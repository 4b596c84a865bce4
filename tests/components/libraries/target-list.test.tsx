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
  });
});
