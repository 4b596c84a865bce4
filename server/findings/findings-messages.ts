import type { ApiError, FieldIssue } from '../../shared/api-error';
import type { Suite } from '../../shared/schemas/suite-schema';

/** One computation for the findings thread (findings-worker.ts); functions are named by their fingerprint labels. */
export type FindingsRequest =
  | { id: number; kind: 'fingerprint'; target: string; functions: string[] }
  | {
      id: number;
      kind: 'cut-map';
      target: string;
      fn: string;
      box: [number, number, number, number];
      grid: [number, number];
    }
  | { id: number; kind: 'version-matrix'; library: string; suites: Suite[] };

/** How an error crosses the thread: the answers a service decides keep their status and body. */
export type FindingsFailure =
  | { kind: 'http'; status: number; body: ApiError }
  | { kind: 'input'; issues: FieldIssue[] }
  | { kind: 'error'; message: string };

export type FindingsReply =
  { id: number; ok: true; value: unknown } | { id: number; ok: false; failure: FindingsFailure };
