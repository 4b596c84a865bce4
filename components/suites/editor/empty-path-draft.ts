import type { PathDraft } from './suite-draft';

const origin = () => ({ re: '0', im: '0' });

/** A new path: a counter-clockwise circle of radius 2 around 0, the commonest first path. */
export function emptyPathDraft(name: string): PathDraft {
  return {
    kind: 'circle',
    name,
    center: origin(),
    radius: '2',
    startAngle: '0',
    turns: '1',
    direction: 'ccw',
    from: { re: '-1', im: '0' },
    to: { re: '1', im: '0' },
    points: [
      { re: '1', im: '0' },
      { re: '0', im: '1' },
    ],
    sampling: 'samples',
    samples: '65',
    at: '',
    cutKind: 'ray',
    cutFrom: origin(),
    cutTo: { re: '-1', im: '0' },
    along: '0.5, 1, 2',
    offsets: '',
    grid: null,
  };
}
