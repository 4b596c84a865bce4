/** One broken rule of a suite: which suite (its id, or the file when the id is unusable), the field, the rule. */
export interface SuiteIssue {
  suite: string;
  field: string;
  rule: string;
}
