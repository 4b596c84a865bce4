/** Limits on a subject, so a request cannot make the parser or evaluator work without bound. */
export const SUBJECT_LIMITS = { length: 400, depth: 24, nodes: 200 } as const;
