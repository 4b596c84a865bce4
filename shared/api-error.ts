/** One broken rule of an input: the dotted field path and what the rule says. */
export interface FieldIssue {
  field: string;
  rule: string;
}

/**
 * Every error body the API sends. `kind` tells the app how to show it; `issues`
 * is present for `invalid-input` only.
 */
export type ApiError =
  | { kind: 'invalid-input'; message: string; issues: FieldIssue[] }
  | { kind: 'signed-out'; message: string }
  | { kind: 'forbidden'; message: string }
  | { kind: 'not-found'; message: string }
  | { kind: 'wrong-credentials'; message: string }
  | { kind: 'too-many-attempts'; message: string; retryAfterSeconds: number }
  | { kind: 'conflict'; message: string }
  | { kind: 'payload-too-large'; message: string }
  | { kind: 'unsupported-media-type'; message: string }
  /** The server could not answer now (a library computation stopped after its time limit): try again or ask for less. */
  | { kind: 'unavailable'; message: string }
  /** 422: the work asked for passed its time budget and was stopped; the message says what was checked and how to ask for less. */
  | { kind: 'over-time-budget'; message: string; budgetSeconds: number }
  | { kind: 'server-error'; message: string };
