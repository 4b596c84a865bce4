import type { RunView } from '../../shared/run-view';

/** A run of the demo nightly plan one shard into four, as the client's run queries see it. */
export const RUNNING_RUN: RunView = {
  id: '7d3f9a52-1c4e-4b8a-9f10-2a6c5e8d4b31',
  planId: 'p1',
  planName: 'complex.js nightly',
  trigger: 'manual',
  status: 'running',
  shardsTotal: 4,
  shardsDone: 1,
  counts: { pass: 100, fail: 0, error: 0, skipped: 0, notApplicable: 0 },
  byClass: { branch: 0, accuracy: 0 },
  checksStopped: 0,
  checksFailed: 0,
  regressions: null,
  waitingFor: [],
  requestedBy: 'Kwame Asante',
  createdAt: '2026-03-01T02:30:00Z',
  startedAt: '2026-03-01T02:30:01Z',
  finishedAt: null,
};
