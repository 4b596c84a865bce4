import { router, useLocalSearchParams } from 'expo-router';
import { CrumbLink } from '../../../components/ui/crumb-link';
import { CutMapView } from '../../../components/libraries/cut-map-view';
import { QueryState } from '../../../components/ui/query-state';
import { ScreenBody } from '../../../components/ui/screen-body';

/** Where one function of a target is really discontinuous over a box, against the expected cuts. */
export default function CutMapScreen() {
  const { name, fn } = useLocalSearchParams<{ name?: string; fn?: string }>();
  return (
    <ScreenBody
      pageTitle={name && fn ? `Cut map of ${fn} on ${name}` : 'Cut map'}
      title={name && fn ? `Cut map of ${fn}` : 'Cut map'}
      lead={
        name
          ? `${name}, sampled on a grid: every jump between neighbouring grid points is narrowed down, then compared with where the reference puts the cuts.`
          : undefined
      }
    >
      {name ? (
        <CrumbLink label={name} onPress={() => router.navigate({ pathname: '/libraries/target', params: { name } })} />
      ) : null}
      {name && fn ? (
        <CutMapView name={name} fn={fn} onChooseFn={(next) => router.setParams({ fn: next })} />
      ) : (
        <QueryState state="error" message="No target or function named in the address." />
      )}
    </ScreenBody>
  );
}
