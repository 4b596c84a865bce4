import type { Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { SuiteSummary } from '../../shared/suite-summary';
import { SkText } from '../ui/sk-text';
import { SuiteStatusLabel } from './suite-status-label';
import { LinkCard } from '../ui/link-card';

/** One suite in the list: title, subject, its latest version's status, and which version plans use. */
export function SuiteCard({ suite, href }: { suite: SuiteSummary; href?: Href }) {
  const inUse =
    suite.approvedVersion === null
      ? 'no approved version: plans do not use it yet'
      : `plans use v${suite.approvedVersion}`;
  return (
    <LinkCard href={href ?? `/suites/${suite.slug}`} testID={`suite-${suite.slug}`} style={styles.card}>
      <View style={styles.head}>
        <SuiteStatusLabel status={suite.latestStatus} version={suite.latestVersion} />
        <SkText variant="caption" tone="inkFaint">
          {inUse}
        </SkText>
      </View>
      <SkText variant="label">{suite.title}</SkText>
      <SkText variant="mono" tone="inkSoft" numberOfLines={2}>
        {suite.subject}
      </SkText>
      <SkText variant="caption" tone="inkFaint" numberOfLines={1}>
        {suite.slug} · {suite.authorName} ·{' '}
        {new Date(suite.updatedAt).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', year: 'numeric' })}
      </SkText>
    </LinkCard>
  );
}

const styles = StyleSheet.create({
  card: {
    flexGrow: 1,
    flexBasis: 320,
  },
  head: { flexDirection: 'row', alignItems: 'center', gap: theme.space(2), flexWrap: 'wrap' },
});
