import { View } from 'react-native';
import { useSuites } from '../../client/use-suites';
import { useVersionMatrix } from '../../client/use-version-matrix';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { VersionMatrixTable } from './version-matrix-table';

/**
 * The version matrix of one library over every suite with an approved version, asked for in
 * groups: rows appear as groups arrive, a failed group says so and can be asked again.
 */
export function LibraryVersionMatrix({ library }: { library: string }) {
  const suites = useSuites();
  const slugs = (suites.data ?? [])
    .filter((s) => s.approvedVersion !== null)
    .map((s) => s.slug)
    .sort();
  const matrix = useVersionMatrix(library, slugs);

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
