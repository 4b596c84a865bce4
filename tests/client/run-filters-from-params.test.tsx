import { runFiltersFromParams } from '../../client/run-filters-from-params';

describe('runFiltersFromParams', () => {
  it('reads plan, status and trigger from the address', () => {
    expect(
      runFiltersFromParams({ plan: '11111111-1111-4111-8111-111111111111', status: 'running', trigger: 'api' }),
    ).toEqual({
      plan: '11111111-1111-4111-8111-111111111111',
      status: 'running',
      trigger: 'api',
    });
  });

  it('drops what the API would refuse, and takes the first of a repeated parameter', () => {
    expect(
      runFiltersFromParams({ plan: 'nightly', status: ['completed', 'failed'], trigger: 'cron', colour: 'green' }),
    ).toEqual({ plan: undefined, status: 'completed', trigger: undefined });
    expect(runFiltersFromParams({})).toEqual({ plan: undefined, status: undefined, trigger: undefined });
  });
});
