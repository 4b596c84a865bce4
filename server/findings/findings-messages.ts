import type { Suite } from '../../shared/schemas/suite-schema';

/** One computation for the findings thread (findings-worker.ts); functions are named by their fingerprint labels. */
export type FindingsRequest =
  | { id: number; kind: 'fingerprint'; target: string; functions: string[]; entry?: string }
  | {
      id: number;
      kind: 'cut-map';
      target: string;
      fn: string;
      box: [number, number, number, number];
      grid: [number, number];
    }
  | { id: number; kind: 'version-matrix'; library: string; suites: Suite[]; entries?: string[] };
