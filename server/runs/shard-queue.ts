/** Where shards wait for a worker. The server uses the shards table itself (sql-shard-queue.ts); anything with these calls will do. */
export interface ShardQueue {
  enqueue(shardIds: string[]): Promise<void>;
  /** Takes shards one at a time and runs `handle` on each until `stop`. */
  work(handle: (shardId: string) => Promise<void>): Promise<void>;
  stop(): Promise<void>;
}
