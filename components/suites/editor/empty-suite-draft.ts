import { emptyPathDraft } from './empty-path-draft';
import type { SuiteDraft } from './suite-draft';

/** The form's starting point: a principal branch under Annex G with one circle and ulps tolerances. */
export function emptySuiteDraft(): SuiteDraft {
  return {
    id: '',
    version: 1,
    title: '',
    story: '',
    subject: '',
    branchKind: 'principal',
    g: '',
    nuRe: '1/2',
    nuIm: '',
    z0: { re: '2', im: '0' },
    fixBy: 'k',
    f0: { re: '', im: '' },
    k: '0',
    cuts: [],
    convention: 'signed-zero',
    paths: [emptyPathDraft('circle of radius 2')],
    tolerances: { values: { kind: 'ulps', value: '2' }, monodromy: null, properties: null },
    properties: [],
    counterparts: [],
  };
}
