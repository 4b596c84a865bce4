/** A stored run: queued until a worker takes its first shard; finished as completed (every shard done), failed or cancelled. */
export const RUN_STATUSES = ['queued', 'running', 'completed', 'failed', 'cancelled'] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

/** What started a run. */
export const RUN_TRIGGERS = ['schedule', 'manual', 'api'] as const;
export type RunTrigger = (typeof RUN_TRIGGERS)[number];
