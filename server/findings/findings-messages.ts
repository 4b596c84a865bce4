import type { Suite } from '../../shared/schemas/suite-schema';
import type { TargetSource } from '../../shared/target-source';

/** An admin-added target's stored source (row id and source), for the thread to resolve it the first time. */
type Added = { added?: { id: string; source: TargetSource } };

/** One computation for the findings thread (findings-worker.ts); functions are named by their fingerprint labels. */
export type FindingsRequest =
  | ({ id: number; kind: 'fingerprint'; target: string; functions: string[]; entry?: string } & Added)
  | ({
      id: number;
      kind: 'cut-map';
      target: string;
      fn: string;
      box: [number, number, number, number];
      grid: [number, number];
    } & Added)
  | { id: number; kind: 'version-matrix'; library: string; suites: Suite[]; entries?: string[] };
