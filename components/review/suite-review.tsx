import { router } from 'expo-router';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useMe } from '../../client/use-me';
import { useSuite } from '../../client/use-suite';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';
import { TitledPanel } from '../ui/titled-panel';
import { QueryState } from '../ui/query-state';
import { ReviewForm } from './review-form';
import { StoredRulesWarning } from './stored-rules-warning';
import { SuiteDiff } from './suite-diff';
import { SuiteFacts } from '../suites/suite-facts';
import { SuitePreview } from '../suites/suite-preview';
import { SuiteStatusLabel } from '../suites/suite-status-label';
import { authorshipText } from '../suites/authorship-text';

/** Reviewing one submitted version: what it changes against the previous version, its picture, what it checks, and the decision. */
export function SuiteReview({ slug }: { slug: string }) {
  const suite = useSuite(slug);
  const { data: me } = useMe();
  const wide = useWindowDimensions().width >= theme.wide;
  if (!me) return null;
  if (me.role !== 'reviewer' && me.role !== 'admin')
    return <QueryState state="error" message="Only reviewers and admins review suites." />;
  if (suite.isPending) return <QueryState state="loading" />;
  if (suite.isError)
    return <QueryState state="error" message={suite.error.message} onRetry={() => void suite.refetch()} />;
  const current = suite.data.find((v) => v.status === 'submitted');
  if (!current) return <QueryState state="empty" message={`No version of ${slug} waits for review.`} />;
  const previous = suite.data.find((v) => v.version === current.version - 1) ?? null;
  // The server refuses a review from either (suite-service.ts): both wrote words in this version.
  const own = current.author.id === me.id;
  const takenFromMe = current.takenOverFrom?.id === me.id;

  const decision = (
    <TitledPanel title="Decision">
      {own || takenFromMe ? (
        <SkText variant="caption" tone="ink" style={styles.own}>
          {`${own ? 'You wrote this version' : `You wrote this draft before ${current.author.displayName} edited it and took it over`}. Four eyes: another reviewer must review it, and the server will refuse your review.`}
        </SkText>
      ) : null}
      <StoredRulesWarning body={current.body} />
      <ReviewForm
        slug={slug}
        version={current.version}
        onReviewed={() =>
          router.replace({ pathname: '/review', params: { reviewed: slug, version: String(current.version) } })
        }
      />
    </TitledPanel>
  );
  const changes = (
    <TitledPanel title="What changed">
      <SuiteDiff current={current} previous={previous} />
    </TitledPanel>
  );
  const picture = (
    <TitledPanel title="Plane picture">
      <SuitePreview
        body={current.body}
        label={`Plane picture of ${current.body.title}`}
        testID="review-picture"
        height={wide ? 360 : 280}
      />
    </TitledPanel>
  );
  const facts = (
    <TitledPanel title="What this version checks">
      <SuiteFacts suite={current.body} />
    </TitledPanel>
  );
  return (
    <View style={styles.column}>
      <View style={styles.head}>
        <SuiteStatusLabel status={current.status} version={current.version} />
        <SkText variant="caption">
          {slug} · {authorshipText(current)}
        </SkText>
      </View>
      {wide ? (
        <View style={styles.wide}>
          <View style={styles.mainCol}>
            {changes}
            {picture}
          </View>
          <View style={styles.sideCol}>
            {decision}
            {facts}
          </View>
        </View>
      ) : (
        // On a phone the decision follows the changes, one thumb-scroll from what it decides on.
        <>
          {changes}
          {decision}
          {picture}
          {facts}
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  column: { gap: theme.space(4) },
  wide: { flexDirection: 'row', gap: theme.space(4), alignItems: 'flex-start' },
  mainCol: { flex: 3, minWidth: 0, gap: theme.space(4) },
  sideCol: { flex: 2, minWidth: 0, gap: theme.space(4) },
  head: { flexDirection: 'row', alignItems: 'center', gap: theme.space(3), flexWrap: 'wrap' },
  own: { backgroundColor: theme.color.submittedSoft, padding: theme.space(2), borderRadius: theme.radius },
});
