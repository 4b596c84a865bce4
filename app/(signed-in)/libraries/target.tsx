import { router, useLocalSearchParams } from 'expo-router';
import { CrumbLink } from '../../../components/ui/crumb-link';
import { QueryState } from '../../../components/ui/query-state';
import { ScreenBody } from '../../../components/ui/screen-body';
import { TargetFingerprint } from '../../../components/libraries/target-fingerprint';

/** One target: which convention it appears to follow on each cut of each function, with the evidence. */
export default function TargetScreen() {
  const { name } = useLocalSearchParams<{ name?: string }>();
  return (
    <ScreenBody
      pageTitle={name ?? 'Library'}
      title={name ? `${name}` : 'Library'}
      lead="Convention fingerprint: on each cut of each function, what this version returns exactly on the cut with +0 and with −0."
    >
      <CrumbLink label="Libraries" onPress={() => router.navigate('/libraries')} />
      {name ? (
        <TargetFingerprint
          name={name}
          onOpenCutMap={(fn) => router.push({ pathname: '/libraries/cut-map', params: { name, fn } })}
        />
      ) : (
        <QueryState state="error" message="No target named in the address." />
      )}
    </ScreenBody>
  );
}
