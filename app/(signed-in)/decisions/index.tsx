import { router, useLocalSearchParams } from 'expo-router';
import { DecisionList } from '../../../components/decisions/decision-list';
import { ScreenBody } from '../../../components/ui/screen-body';
import { decisionListQuery, type DecisionListQuery } from '../../../shared/schemas/decision-list-query';

/** Reads the address's filters with the route's own schema; a filter it refuses is left out. */
function filtersOf(params: Record<string, string | string[] | undefined>): DecisionListQuery {
  const filters: Record<string, string> = {};
  for (const key of ['library', 'suite', 'id'] as const) {
    const value = params[key];
    if (typeof value === 'string' && decisionListQuery.safeParse({ [key]: value }).success) filters[key] = value;
  }
  return filters;
}

/** Decisions: what reviewers and maintainers decided about failures, with scope, expiry and author; filters live in the address. */
export default function DecisionsScreen() {
  const filters = filtersOf(useLocalSearchParams());
  return (
    <ScreenBody
      title="Decisions"
      lead="Every verdict given on a failure: accepted deviations, bugs and convention differences, with what each covers, until when, and who decided. Expired and revoked ones stay listed."
    >
      <DecisionList
        filters={filters}
        onChange={(next) =>
          router.push({
            pathname: '/decisions',
            params: Object.fromEntries(Object.entries(next).filter(([, v]) => v)) as Record<string, string>,
          })
        }
      />
    </ScreenBody>
  );
}
