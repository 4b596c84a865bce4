import { Link } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { OverviewView, WaitingSuite } from '../../shared/overview-view';
import type { Role } from '../../shared/roles';
import { formatWhen } from '../runs/format-when';

type NeedsMe = OverviewView['needsMe'];

function Row({ href, label, children }: { href: string; label: string; children: ReactNode }) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" accessibilityLabel={label} style={StyleSheet.flatten(styles.row)}>
        <View style={styles.rowBody}>{children}</View>
        <Text style={styles.chevron}>→</Text>
      </Pressable>
    </Link>
  );
}

function Group({
  title,
  count,
  empty,
  children,
}: {
  title: string;
  count: number;
  empty: string;
  children: ReactNode;
}) {
  return (
    <View style={styles.group}>
      <Text accessibilityRole="header" style={styles.groupTitle}>
        {title} <Text style={styles.count}>({count})</Text>
      </Text>
      {count === 0 ? <Text style={styles.empty}>✓ {empty}</Text> : children}
    </View>
  );
}

const suiteLine = (s: WaitingSuite) => `${s.title || s.slug} · v${s.version}`;

/**
 * What waits on the signed-in person: suites to review (reviewers, admins), their own suites
 * sent back with changes requested, and regressions on the libraries they subscribe to.
 */
export function NeedsMePanel({ needsMe, role, now }: { needsMe: NeedsMe; role: Role; now?: number }) {
  const showSentBack = role === 'contributor' || needsMe.changesRequested.length > 0;
  const total = (needsMe.reviewQueue?.length ?? 0) + needsMe.changesRequested.length + needsMe.regressions.length;
  return (
    <View style={styles.panel} testID="needs-me">
      <Text accessibilityRole="header" style={styles.title}>
        {total > 0 ? `◊ Waiting for you: ${total}` : '✓ Nothing is waiting for you'}
      </Text>
      {needsMe.reviewQueue ? (
        <Group title="Suites to review" count={needsMe.reviewQueue.length} empty="No suite is waiting for review.">
          {needsMe.reviewQueue.map((s) => (
            <Row
              key={`${s.slug}-${s.version}`}
              href={`/review/${encodeURIComponent(s.slug)}`}
              label={`Review ${s.slug} version ${s.version}`}
            >
              <Text style={styles.main}>{suiteLine(s)}</Text>
              <Text style={styles.sub}>
                by {s.authorName}, submitted {formatWhen(s.since, now)}
              </Text>
            </Row>
          ))}
        </Group>
      ) : null}
      {showSentBack ? (
        <Group
          title="Your suites sent back"
          count={needsMe.changesRequested.length}
          empty="None of your suites needs changes."
        >
          {needsMe.changesRequested.map((s) => (
            <Row
              key={`${s.slug}-${s.version}`}
              href={`/suites/${encodeURIComponent(s.slug)}`}
              label={`Open ${s.slug}, changes requested`}
            >
              <Text style={styles.main}>↺ {suiteLine(s)}</Text>
              <Text style={styles.sub}>
                changes requested by {s.reviewerName ?? 'a reviewer'}, {formatWhen(s.since, now)}
              </Text>
              {s.reviewComment ? <Text style={styles.quote}>“{s.reviewComment}”</Text> : null}
            </Row>
          ))}
        </Group>
      ) : null}
      <Group
        title="Regressions on your libraries"
        count={needsMe.regressions.length}
        empty={
          needsMe.subscriptions.length
            ? `No regressions on ${needsMe.subscriptions.join(', ')} in the latest runs.`
            : 'You subscribe to no library (Settings).'
        }
      >
        {needsMe.regressions.map((r) => (
          <Row
            key={`${r.runId}-${r.targetKey}`}
            href={`/failures?${new URLSearchParams({ run: r.runId, status: 'new' }).toString()}`}
            label={`${r.count} regressions on ${r.targetKey} in ${r.planName}`}
          >
            <Text style={[styles.main, styles.danger]}>
              ❌ {r.count} regression{r.count === 1 ? '' : 's'} on {r.targetKey}
            </Text>
            <Text style={styles.sub}>
              {r.planName}, finished {formatWhen(r.finishedAt, now)}
            </Text>
          </Row>
        ))}
      </Group>
    </View>
  );
}

const styles = StyleSheet.create({
  panel: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    padding: theme.space(4),
    gap: theme.space(4),
  },
  title: { fontFamily: theme.font.bold, fontSize: theme.size.large, color: theme.color.ink },
  group: { gap: theme.space(1) },
  groupTitle: {
    fontFamily: theme.font.medium,
    fontSize: theme.size.small,
    color: theme.color.inkFaint,
    textTransform: 'uppercase',
    letterSpacing: 0.8,
  },
  count: { fontFamily: theme.font.mono },
  empty: {
    fontFamily: theme.font.regular,
    fontSize: theme.size.small,
    color: theme.color.inkSoft,
    paddingVertical: theme.space(1),
  },
  row: {
    minHeight: 56,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingVertical: theme.space(2),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  rowBody: { flex: 1, gap: 2 },
  chevron: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.inkFaint },
  main: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.ink },
  sub: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
  quote: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.ink, fontStyle: 'italic' },
  danger: { color: theme.color.danger },
});
