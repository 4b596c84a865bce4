import type { z } from 'zod';
import type { workerViewSchema } from './worker-view-schema';

/** A live worker process as `GET /api/workers` lists it. Declared by its schema (`worker-view-schema.ts`). */
export type WorkerView = z.infer<typeof workerViewSchema>;
