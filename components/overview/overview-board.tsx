import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useOverview } from '../../client/use-overview';
import { theme } from '../../constants/theme';
import type { PublicUser } from '../../shared/public-user';
import { SkText } from '../ui/sk-text';
import { NeedsMePanel } from './needs-me-panel';
import { PlanLatestCard } from './plan-latest-card';
import { QueryState } from '../ui/query-state';
import { RoleBadge } from '../settings/role-badge';
import { RunCard } from '../runs/run-card';

/**
 * The Overview: who is signed in; what waits on them; runs in progress (live); and the latest
 * run of every plan. Two columns on a wide screen, one on a phone with "waiting for you" first.
 */
export function OverviewBoard({ user }: { user: PublicUser }) {
  const overview = useOverview();
  const wide = useWindowDimensions().width >= theme.wide;

  const who = (
    <View style={styles.who}>
      <SkText variant="monoBody" tone="inkSoft" testID="home-email">
        {user.email}
      </SkText>
      <RoleBadge role={user.role} />
    </View>
  );
  const note = (
    <View style={styles.note}>
      <SkText variant="caption" style={styles.noteText}>
        A green result in Sheetkeeper is evidence for the points, paths and conventions that a suite checked — not a
        certificate that a library is correct everywhere.
      </SkText>
    </View>
  );

  if (overview.isPending || overview.isError) {
    return (
      <View style={styles.column}>
        {who}
        {overview.isPending ? (
          <QueryState state="loading" />
        ) : (
          <QueryState state="error" message={overview.error.message} onRetry={() => void overview.refetch()} />
        )}
        {note}
      </View>
    );
  }

  const { plans, inProgress, needsMe } = overview.data;
  const needs = <NeedsMePanel needsMe={needsMe} role={user.role} />;
  const running = (
    <View style={styles.section}>
      <SkText variant="heading" accessibilityRole="header">
        ↻ In progress{' '}
        <SkText variant="monoBody" tone="inkSoft">
          ({inProgress.length})
        </SkText>
      </SkText>
      {inProgress.length === 0 ? (
        <SkText variant="caption">No run is queued or running.</SkText>
      ) : (
        <View style={styles.cards}>
          {inProgress.map((run) => (
            <RunCard key={run.id} run={run} />
          ))}
        </View>
      )}
    </View>
  );
  const latest = (
    <View style={styles.section}>
      <SkText variant="heading" accessibilityRole="header">
        Latest run of each plan
      </SkText>
      {plans.length === 0 ? (
        <QueryState state="empty" message="No plans yet. A maintainer makes one under Plans." />
      ) : (
        <View style={[styles.cards, wide && styles.cardsWide]}>
          {plans.map((plan) => (
            <PlanLatestCard key={plan.planId} plan={plan} inRow={wide} />
          ))}
        </View>
      )}
    </View>
  );

  if (wide) {
    return (
      <View style={styles.column}>
        {who}
        <View style={styles.twoColumns}>
          <View style={styles.main}>
            {running}
            {latest}
          </View>
          <View style={styles.side}>
            {needs}
            {note}
          </View>
        </View>
      </View>
    );
  }
  return (
    <View style={styles.column}>
      {who}
      {needs}
      {running}
      {latest}
      {note}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: theme.space(5) },
  who: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', gap: theme.space(3) },
  twoColumns: { flexDirection: 'row', alignItems: 'flex-start', gap: theme.space(6) },
  main: { flex: 3, gap: theme.space(6) },
  side: { flex: 2, gap: theme.space(4) },
  section: { gap: theme.space(3) },
  cards: { gap: theme.space(3) },
  cardsWide: { flexDirection: 'row', flexWrap: 'wrap' },
  note: { borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(3) },
  noteText: { lineHeight: 20 },
});
