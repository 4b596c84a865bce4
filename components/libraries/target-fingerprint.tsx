import { View } from 'react-native';
import { useFingerprint } from '../../client/use-fingerprint';
import { theme } from '../../constants/theme';
import { ComputedNote } from './computed-note';
import { FingerprintTable } from './fingerprint-table';
import { QueryState } from '../ui/query-state';

/** One target's convention fingerprint, fetched, with loading, error and empty states. */
export function TargetFingerprint({ name, onOpenCutMap }: { name: string; onOpenCutMap: (fn: string) => void }) {
  const fp = useFingerprint(name);
  if (fp.isPending) return <QueryState state="loading" />;
  if (fp.isError) return <QueryState state="error" message={fp.error.message} onRetry={() => void fp.refetch()} />;
  const { fingerprint } = fp.data;
  if (fingerprint.cuts.length === 0) {
    return (
      <QueryState
        state="empty"
        message={`${name} has none of the functions with a cut (${fingerprint.missing.join(', ')}), so there is nothing to fingerprint.`}
      />
    );
  }
  return (
    <View style={{ gap: theme.space(2) }}>
      <ComputedNote answer={fp.data} />
      <FingerprintTable fingerprint={fingerprint} onOpenCutMap={onOpenCutMap} />
    </View>
  );
}
