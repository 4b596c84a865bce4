import type { DecisionView } from './decision-view';
import type { DiagnosisKind } from './diagnosis';
import { DIAGNOSIS_KIND_NAMES } from './diagnosis-kind-names';

/** A stored diagnosis kind in the words the chips use; a kind this version does not know, as stored. */
const kindName = (kind: string | null): string =>
  kind === null ? '?' : (DIAGNOSIS_KIND_NAMES[kind as DiagnosisKind]?.name ?? kind);

/** What a decision's scope is made of: the form knows it before saving, a stored decision carries it. */
export type DecisionScope = Pick<
  DecisionView,
  'scope' | 'versions' | 'targetKey' | 'targetVersion' | 'suiteSlug' | 'pathName' | 'diagnosisKind' | 'failureId'
>;

/** Which failures of the suite, in words. */
function which(d: DecisionScope): string {
  switch (d.scope) {
    case 'point':
      return `the point of failure #${d.failureId ?? '?'} in suite ${d.suiteSlug}`;
    case 'path':
      return `every failure on path “${d.pathName ?? '?'}” of suite ${d.suiteSlug}`;
    case 'diagnosis':
      return `every failure diagnosed “${kindName(d.diagnosisKind)}” in suite ${d.suiteSlug}`;
    case 'suite':
      return `every failure in suite ${d.suiteSlug}`;
  }
}

/** Which versions of which library, in words. */
function describeDecisionVersions(d: Pick<DecisionScope, 'versions' | 'targetKey' | 'targetVersion'>): string {
  if (d.versions === 'every-version' || d.targetVersion === null)
    return `on every version of ${d.targetKey}, earlier ones and runs already stored included`;
  if (d.versions === 'this-version') return `on ${d.targetKey} ${d.targetVersion} only`;
  return `on ${d.targetKey} ${d.targetVersion} and every later version`;
}

/**
 * A decision's scope as one sentence, the same words before saving (the verdict form) and after
 * (the Decisions screen, the case page): "every failure in suite sqrt-principal on complex.js
 * 2.4.3 only". Each part is read from what the server stores, so the words cannot promise more
 * or less than the decision covers.
 */
export function describeDecisionScope(d: DecisionScope): string {
  return `${which(d)} ${describeDecisionVersions(d)}`;
}
