import { useState } from 'react';
import { View } from 'react-native';
import { useFingerprint } from '../../client/use-fingerprint';
import { useTargets } from '../../client/use-targets';
import { theme } from '../../constants/theme';
import { ComputedNote } from './computed-note';
import { FingerprintTable } from './fingerprint-table';
import { ChipGroup } from '../ui/chip-group';
import { QueryState } from '../ui/query-state';

/**
 * One target's convention fingerprint, fetched, with loading, error and empty states, and a choice
 * of the entry values are built through (the default first): a constructor that drops −0 shows
 * at its own entry. Entries without a zero imaginary sign (a plain number) cannot be on a cut's
 * side, so they are not offered.
 */
export function TargetFingerprint({ name, onOpenCutMap }: { name: string; onOpenCutMap: (fn: string) => void }) {
  const [entry, setEntry] = useState<string | undefined>(undefined);
  const targets = useTargets();
  const entries = (targets.data?.find((t) => t.name === name)?.entries ?? []).filter(
    (e) => e.carries.imaginaryZeroSign,
  );
  const fp = useFingerprint(name, entry);
  const chooser =
    entries.length > 1 ? (
      <ChipGroup
        label="Values built through"
        options={entries.map((e) => ({ value: e.default ? undefined : e.name, text: `${e.name}: ${e.call}` }))}
        value={entry}
        onChange={setEntry}
      />
    ) : null;
  if (fp.isPending)
    return (
      <View style={{ gap: theme.space(2) }}>
        {chooser}
        <QueryState state="loading" />
      </View>
    );
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
      {chooser}
      <ComputedNote answer={fp.data} />
      <FingerprintTable fingerprint={fingerprint} onOpenCutMap={onOpenCutMap} />
    </View>
  );
}
