import { createTask, validateDetailed } from 'node-cron';
import { InputError } from '../http/input-error';

/** node-cron's names for the parts of an expression, as a person says them. */
const PART_NAMES: Record<string, string> = {
  second: 'second',
  minute: 'minute',
  hour: 'hour',
  dayOfMonth: 'day-of-month',
  month: 'month',
  dayOfWeek: 'day-of-week',
};

/**
 * Checks a cron expression field by field with node-cron and answers the next `count` times it
 * fires in `timeZone`. A bad expression is a 400 naming `field` and what is wrong with which part.
 */
export function nextCronRuns(cron: string, timeZone: string, count = 3, field = 'body.cron'): Date[] {
  const checked = validateDetailed(cron);
  // Each rule reads after the field's name in a form ("Cron expression has an invalid hour field: \"25\"").
  if (!checked.valid) throw new InputError([{ field, rule: checked.errors.map(describe).join('; ') }]);
  const task = createTask(cron, () => undefined, { timezone: timeZone });
  try {
    return task.getNextRuns(count);
  } finally {
    void task.destroy();
  }
}

function describe(error: { field: string; value?: string; message: string }): string {
  if (error.value === undefined) return error.message;
  if (error.field === 'expression') return `must have 5 or 6 fields (it has ${error.value.trim().split(/\s+/).length})`;
  const part = PART_NAMES[error.field];
  return part ? `has an invalid ${part} field: "${error.value}"` : error.message;
}
