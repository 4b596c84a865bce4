import { runListQuery } from '../shared/schemas/run-list-query';
import type { RunFilters } from './use-runs';

const first = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

/**
 * The Runs filters from the address (`/runs?plan=…&status=running`), so a filtered list can be
 * linked to. A value the API would refuse is dropped rather than sent.
 */
export function runFiltersFromParams(params: Record<string, string | string[] | undefined>): RunFilters {
  const pick = <K extends keyof RunFilters>(key: K): RunFilters[K] => {
    const parsed = runListQuery.shape[key].safeParse(first(params[key]));
    return parsed.success ? (parsed.data as RunFilters[K]) : undefined;
  };
  return { plan: pick('plan'), status: pick('status'), trigger: pick('trigger') };
}
