/** Where shards wait for a worker. The server uses pg-boss; anything with these two calls will do. */
export interface ShardQueue {
  enqueue(shardIds: string[]): Promise<void>;
  /** Takes shards one at a time and runs `handle` on each until `stop`. */
  work(handle: (shardId: string) => Promise<void>): Promise<void>;
  stop(): Promise<void>;
}
