import { router, useLocalSearchParams } from 'expo-router';
import type { FailureFilters } from '../../../client/failure-filters';
import { filtersFromParams } from '../../../client/filters-from-params';
import { FailureBrowser } from '../../../components/failures/failure-browser';
import { ScreenBody } from '../../../components/ui/screen-body';

/** The failure table; its filters live in the address, so `/failures?run=…&suite=…` opens filtered and the back button undoes a filter. */
export default function FailuresScreen() {
  const { filters, dropped } = filtersFromParams(useLocalSearchParams());
  const onChange = (next: FailureFilters) =>
    router.push({ pathname: '/failures', params: next as Record<string, string> });
  return (
    <ScreenBody
      title="Failures"
      lead="Every point that did not pass, with why. Open one to see where on the plane it failed."
    >
      <FailureBrowser filters={filters} onChange={onChange} dropped={dropped} />
    </ScreenBody>
  );
}
