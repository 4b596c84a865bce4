import { StyleSheet, View } from 'react-native';
import { useSuites } from '../../client/use-suites';
import { theme } from '../../constants/theme';
import { QueryState } from '../ui/query-state';
import { ReviewConfirmation } from './review-confirmation';
import { SuiteCard } from '../suites/suite-card';
import { SkText } from '../ui/sk-text';

/**
 * Suites whose latest version waits for review, oldest activity last; each opens its diff and the
 * review form. `reviewed` names the version just decided, confirmed above the queue.
 */
export function ReviewQueue({ reviewed }: { reviewed?: { slug: string; version: number } }) {
  const queue = useSuites({ status: 'submitted' });
  const confirmation = reviewed ? <ReviewConfirmation slug={reviewed.slug} version={reviewed.version} /> : null;
  if (queue.isPending) return <QueryState state="loading" />;
  if (queue.isError)
    return <QueryState state="error" message={queue.error.message} onRetry={() => void queue.refetch()} />;
  if (queue.data.length === 0)
    return (
      <View style={styles.box}>
        {confirmation}
        <QueryState state="empty" message="Nothing waits for review." />
      </View>
    );
  return (
    <View style={styles.box}>
      {confirmation}
      <SkText variant="body" tone="inkSoft">
        {queue.data.length} {queue.data.length === 1 ? 'version waits' : 'versions wait'} for review. Open one to see
        what it changes.
      </SkText>
      <View style={styles.grid}>
        {queue.data.map((s) => (
          <SuiteCard key={s.slug} suite={s} href={`/review/${s.slug}`} />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
});
