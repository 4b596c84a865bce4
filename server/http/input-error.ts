import type { FieldIssue } from '../../shared/api-error';

/** Thrown by `parseInput`; the error handler turns it into a 400 with the issues. */
export class InputError extends Error {
  constructor(readonly issues: FieldIssue[]) {
    super(`invalid input: ${issues.map((i) => `${i.field} ${i.rule}`).join('; ')}`);
  }
}
