import type { SuiteInput } from '../../../../shared/schemas/suite-schema';

/** √z as the regular branch of z^(1/2) with k = 0 at z0 = 1, cut along (−∞, 0]. */
export const sqrtBranch: SuiteInput['branch'] = {
  kind: 'regular',
  g: 'z',
  nu: '1/2',
  z0: { re: '1', im: '0' },
  k: 0,
  cuts: [
    {
      points: [
        { re: '0', im: '0' },
        { re: '-1', im: '0' },
      ],
      to_infinity: true,
    },
  ],
};
