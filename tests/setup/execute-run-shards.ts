import type { DataSource } from 'typeorm';
import type { MailOutbox } from '../../server/mail/mail-outbox';
import { ShardExecutor, type ShardExecutorOptions } from '../../server/runs/shard-executor';

/** Runs every shard of a run, one after another, through the real shard executor; its mail goes nowhere. */
export async function executeRunShards(
  dataSource: DataSource,
  runId: string,
  openTarget: ShardExecutorOptions['openTarget'],
): Promise<void> {
  const executor = new ShardExecutor(dataSource, {
    openTarget,
    outbox: { enqueue: async () => undefined } as unknown as MailOutbox,
    appUrl: 'http://127.0.0.1',
  });
  for (const { id } of await dataSource.query(`SELECT id FROM shards WHERE run_id = $1`, [runId]))
    await executor.execute(id);
}
