import type { Target } from '../../harness/adapters/target';

/** The target without one operation, as complex.js lacks cbrt: every point that needs it is skipped for that reason. */
export function withoutOperation(target: Target, op: string): Target {
  return { ...target, supports: async (asked: string) => asked !== op && (await target.supports(asked)) };
}
