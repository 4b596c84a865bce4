import { useState } from 'react';
import { View } from 'react-native';
import { useSuites } from '../../client/use-suites';
import { useTargets } from '../../client/use-targets';
import { libraryKey } from '../../shared/library-key';
import { ChipGroup } from '../ui/chip-group';
import { useVersionMatrix } from '../../client/use-version-matrix';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { VersionMatrixTable } from './version-matrix-table';

/**
 * The version matrix of one library over every suite with an approved version, asked for in
 * groups: rows appear as groups arrive, a failed group says so and can be asked again. The
 * inputs go in through each suite's own entry, or through one entry every installed version
 * offers: a release whose constructor drops −0 shows at the constructor's entry.
 */
export function LibraryVersionMatrix({ library }: { library: string }) {
  const [entry, setEntry] = useState<string | undefined>(undefined);
  const targets = useTargets();
  const versions = (targets.data ?? []).filter((t) => t.installed && libraryKey(t.name) === library);
  const common = (versions[0]?.entries ?? []).filter((e) =>
    versions.every((v) => (v.entries ?? []).some((x) => x.name === e.name)),
  );
  const suites = useSuites();
  const slugs = (suites.data ?? [])
    .filter((s) => s.approvedVersion !== null)
    .map((s) => s.slug)
    .sort();
  const matrix = useVersionMatrix(library, slugs, entry);

  if (suites.isPending) return <QueryState state="loading" />;
  if (suites.isError)
    return <QueryState state="error" message={suites.error.message} onRetry={() => void suites.refetch()} />;
  if (slugs.length === 0)
    return (
      <QueryState
        state="empty"
        message="No suite has an approved version yet, so there is nothing to compare across versions."
      />
    );

  const firstError = matrix.failed[0]?.error;
  return (
    <View style={{ gap: theme.space(3) }}>
      {common.length > 1 ? (
        <ChipGroup
          label="Inputs built through"
          options={[
            { value: undefined, text: 'each suite’s own entry' },
            ...common.map((e) => ({ value: e.name, text: `${e.name}: ${e.call}` })),
          ]}
          value={entry}
          onChange={setEntry}
        />
      ) : null}
      <SkText variant="caption" accessibilityLiveRegion="polite">
        {matrix.done === matrix.groups
          ? `All ${slugs.length} approved suites compared.`
          : `Compared ${matrix.done} of ${matrix.groups} groups of suites… The first visit runs every suite on every installed version; the server keeps the answers for the next.`}
      </SkText>
      {firstError ? (
        <View style={{ gap: theme.space(2) }}>
          <QueryState
            state="error"
            message={`${matrix.failed.length} group(s) of suites could not be compared: ${firstError.message}`}
          />
          <ActionButton
            label="Try those again"
            tone="quiet"
            onPress={() => matrix.failed.forEach((q) => void q.refetch())}
          />
        </View>
      ) : null}
      {matrix.suites.length === 0 && !firstError ? (
        <QueryState state="loading" />
      ) : (
        <VersionMatrixTable
          library={library}
          versions={matrix.versions}
          suites={matrix.suites}
          pending={matrix.pendingSuites}
        />
      )}
    </View>
  );
}
