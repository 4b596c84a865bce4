import type { ShardQueue } from '../../server/runs/shard-queue';

/** A queue that keeps what it is given and runs nothing: for route tests, where runs only need to start. */
export function idleShardQueue(): ShardQueue & { enqueued: string[] } {
  const enqueued: string[] = [];
  return {
    enqueued,
    enqueue: async (ids) => {
      enqueued.push(...ids);
    },
    work: async () => undefined,
    stop: async () => undefined,
  };
}
