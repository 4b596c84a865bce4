import { z } from 'zod';

/** A live worker process (the server or an `npm run worker`, on any machine) as `GET /api/workers` lists it; the OpenAPI document shows this schema. */
export const workerViewSchema = z.object({
  id: z.string().meta({ description: 'A UUID.' }),
  label: z.string().meta({ description: '"host:pid", as the run page names the worker beside each pair it ran.' }),
  targets: z.array(z.string()).meta({ description: 'The target names it takes shards for.' }),
  startedAt: z.string().meta({ description: 'ISO 8601.' }),
  heartbeatAt: z.string().meta({ description: 'ISO 8601: its last beat (every 5 s while it runs).' }),
});
