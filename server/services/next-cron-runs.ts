import { createTask, validateDetailed } from 'node-cron';
import { InputError } from './input-error';

/**
 * Checks a cron expression field by field with node-cron and answers the next `count` times it
 * fires in `timeZone`. A bad expression is a 400 naming `field` and what is wrong with which part.
 */
export function nextCronRuns(cron: string, timeZone: string, count = 3, field = 'body.cron'): Date[] {
  const checked = validateDetailed(cron);
  if (!checked.valid) throw new InputError([{ field, rule: checked.errors.map((e) => e.message).join('; ') }]);
  const task = createTask(cron, () => undefined, { timezone: timeZone });
  try {
    return task.getNextRuns(count);
  } finally {
    void task.destroy();
  }
}
