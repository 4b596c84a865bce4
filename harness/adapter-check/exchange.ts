/** One request adapter-check sent to a stdio program and what came of it (program-channel.ts). */
export interface Exchange {
  /** The id sent; null for a raw line (which should be answered with id null). */
  id: number | null;
  /** The operation asked; null for a raw line. */
  op: string | null;
  /** The number of items in `args`. */
  items: number;
  /** Milliseconds from writing the request to its outcome. */
  ms: number;
  /** The time limit this request had (the start-up allowance included on a fresh program). */
  limitMs: number;
  outcome:
    | { kind: 'answer'; line: string; message: unknown }
    | { kind: 'answer'; line: string; notJson: string }
    | { kind: 'timeout' }
    | { kind: 'exited'; what: string };
}
