import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';
import { refusalMessage } from '../../client/refusal-message';
import { useDecisions } from '../../client/use-decisions';
import { useMe } from '../../client/use-me';
import { useRevokeDecision } from '../../client/use-revoke-decision';
import { theme } from '../../constants/theme';
import type { DecisionListQuery } from '../../shared/schemas/decision-list-query';
import { ChipGroup } from '../ui/chip-group';
import { DoneNote } from '../ui/done-note';
import { FailureAlert } from '../ui/failure-alert';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { CLASSIFICATION_WORDS } from './classification-words';
import { DecisionCard } from './decision-card';

const distinct = (values: string[]) => [...new Set(values)].sort();

/**
 * The Decisions screen's body: every decision (accepted deviations, and bug and convention
 * verdicts), newest first, filtered by library and suite (chips built from the decisions there
 * are), or one decision when a case page links to it. Reviewers and admins revoke one after a
 * second tap, and the screen says so when it is done.
 */
export function DecisionList({
  filters,
  onChange,
}: {
  filters: DecisionListQuery;
  onChange: (next: DecisionListQuery) => void;
}) {
  const all = useDecisions({});
  const shown = useDecisions(filters);
  const me = useMe();
  const revoke = useRevokeDecision();
  const [revoked, setRevoked] = useState<string | null>(null);
  const mayRevoke = me.data?.role === 'reviewer' || me.data?.role === 'admin';

  if (all.isPending || shown.isPending) return <QueryState state="loading" />;
  if (all.isError || shown.isError) {
    const failed = all.isError ? all : shown;
    return <QueryState state="error" message={failed.error!.message} onRetry={() => void failed.refetch()} />;
  }
  const libraries = distinct(all.data.map((d) => d.targetKey));
  const suites = distinct(
    all.data.filter((d) => !filters.library || d.targetKey === filters.library).map((d) => d.suiteSlug),
  );
  const failure = refusalMessage(revoke.error, 'The server could not be reached; the decision still applies.');
  const counts = (['in-force', 'expired', 'revoked'] as const).map(
    (s) => `${shown.data.filter((d) => d.state === s).length} ${s.replace('-', ' ')}`,
  );

  return (
    <View style={styles.root}>
      {filters.id ? (
        <Link href="/decisions" asChild>
          <Pressable accessibilityRole="link" style={StyleSheet.flatten(styles.back)}>
            <SkText variant="label" tone="accent">
              ← Every decision
            </SkText>
          </Pressable>
        </Link>
      ) : (
        <View style={styles.filters}>
          <ChipGroup
            label="Library"
            value={filters.library}
            onChange={(library) => onChange({ library, suite: undefined })}
            options={[{ value: undefined, text: 'any' }, ...libraries.map((l) => ({ value: l, text: l }))]}
          />
          <ChipGroup
            label="Suite"
            value={filters.suite}
            onChange={(suite) => onChange({ ...filters, suite })}
            options={[{ value: undefined, text: 'any' }, ...suites.map((s) => ({ value: s, text: s }))]}
          />
        </View>
      )}
      {revoked ? (
        <DoneNote text={`✓ Revoked: ${revoked} no longer applies. It stays listed below as revoked.`} />
      ) : null}
      {failure ? <FailureAlert message={failure} /> : null}
      {shown.data.length === 0 ? (
        <QueryState
          state="empty"
          message={
            filters.library || filters.suite || filters.id
              ? 'No decision matches these filters.'
              : 'No decisions yet. A verdict given on a failure’s page (bug, convention difference or accepted deviation) is listed here.'
          }
        />
      ) : (
        <View>
          <SkText variant="smallLabel" accessibilityLiveRegion="polite">
            {shown.data.length} {shown.data.length === 1 ? 'decision' : 'decisions'}: {counts.join(', ')}
          </SkText>
          {shown.data.map((d) => (
            <DecisionCard
              key={d.id}
              decision={d}
              revoking={revoke.isPending && revoke.variables === d.id}
              onRevoke={
                mayRevoke
                  ? () =>
                      revoke.mutate(d.id, {
                        onSuccess: () => setRevoked(`the ${CLASSIFICATION_WORDS[d.classification]} on ${d.suiteSlug}`),
                      })
                  : undefined
              }
            />
          ))}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(4) },
  filters: { gap: theme.space(3) },
  back: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
});
