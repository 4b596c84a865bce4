import type { PropertyDraft } from './suite-draft';

/** A new property check: conjugate symmetry near the cuts, 200 runs, a pinned seed. */
export function emptyPropertyDraft(): PropertyDraft {
  return {
    law: 'conjugate-symmetry',
    region: 'near-cuts',
    center: { re: '0', im: '0' },
    radius: '1',
    min: { re: '-2', im: '-2' },
    max: { re: '2', im: '2' },
    distance: '1e-6',
    power: '2',
    runs: '200',
    seed: '20260',
  };
}
