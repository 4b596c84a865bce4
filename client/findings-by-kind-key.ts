import { PLANS_KEY } from './use-plans';

/** The query key prefix of a plan's findings-by-kind picture, for every number of runs it shows. */
export const findingsByKindKey = (planId: string) => [...PLANS_KEY, planId, 'findings-by-kind'] as const;
