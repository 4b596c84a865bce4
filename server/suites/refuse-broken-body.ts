import { checkSuite } from '../../harness';
import { fieldLabel } from '../../shared/field-label';
import { HttpError } from '../http/http-error';

/**
 * Refuses (409, naming each field in the form's words) to move a stored suite version on when its
 * body fails today's full check, the one the form and the upload run (`checkSuite`): a body
 * stored before a rule existed, such as a circle of radius -1 that checks nothing, cannot be
 * submitted or approved; requesting changes stays open so its author hears why.
 */
export function refuseBrokenBody(body: unknown, version: number, becoming: 'submitted' | 'approved'): void {
  const checked = checkSuite(body, 'the suite');
  if (checked.ok) return;
  const rules = checked.issues.map((i) => `${fieldLabel(i.field)} ${i.rule}`).join('; ');
  throw new HttpError(409, {
    kind: 'conflict',
    message: `Version ${version} cannot be ${becoming}: as stored it breaks the suite format's rules (${rules}).${becoming === 'approved' ? ' Request changes instead.' : ' Edit it first.'}`,
  });
}
