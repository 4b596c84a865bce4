import { screen } from '@testing-library/react';
import { TargetList } from '../../../components/libraries/target-list';
import { fakeApiRoutes } from '../../setup/fake-api-routes';
import { renderWithClient } from '../../setup/render-with-client';

const everything = { imaginaryPart: true, realZeroSign: true, imaginaryZeroSign: true };

describe('TargetList', () => {
  it('lists the entries of an installed target, the default marked, and nothing for one recorded before entries', async () => {
    fakeApiRoutes({
      'GET /api/targets': {
        status: 200,
        body: {
          targets: [
            {
              name: 'complex.js@2.4.1',
              library: 'complex.js',
              version: '2.4.1',
              settings: { package: 'complex.js-2.4.1' },
              installed: true,
              entries: [
                { name: 'complex', call: 'new Complex(re, im)', default: true, carries: everything },
                { name: 'string', call: 'new Complex("re±im i")', default: false, carries: everything },
              ],
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
