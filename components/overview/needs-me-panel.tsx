import { Link, type Href } from 'expo-router';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { DiagnosisClass } from '../../shared/diagnosis-class';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import type { OverviewView, WaitingRegression, WaitingSuite } from '../../shared/overview-view';
import { CLASS_WORDS } from '../runs/class-words';
import type { Role } from '../../shared/roles';
import { formatWhen } from '../runs/format-when';
import { regressionsHref } from '../runs/regressions-href';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

type NeedsMe = OverviewView['needsMe'];

/** A link named by the words it shows (WCAG 2.5.3, label in name); the arrow is decoration. */
function Row({ href, children }: { href: Href; children: ReactNode }) {
  return (
    <Link href={href} asChild>
      <Pressable accessibilityRole="link" style={StyleSheet.flatten(styles.row)}>
        <View style={styles.rowBody}>{children}</View>
        <SkText variant="body" tone="inkFaint">
          →
        </SkText>
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
      <SkText variant="smallLabel" tone="inkFaint" accessibilityRole="header" style={styles.groupTitle}>
        {title} <Text style={styles.count}>({count})</Text>
      </SkText>
      {count === 0 ? (
        <SkText variant="caption" style={styles.empty}>
          ✓ {empty}
        </SkText>
      ) : (
        children
      )}
    </View>
  );
}

const suiteLine = (s: WaitingSuite) => `${s.title || s.slug} · v${s.version}`;

/**
 * What waits on the signed-in person: suites to review (reviewers, admins), their own suites
 * sent back with changes requested, and regressions in the plans that mail them and on the
 * libraries they subscribe to, each a link to the failure table filtered to them.
 */
export function NeedsMePanel({ needsMe, role, now }: { needsMe: NeedsMe; role: Role; now?: number }) {
  const showSentBack = role === 'contributor' || needsMe.changesRequested.length > 0;
  const total = (needsMe.reviewQueue?.length ?? 0) + needsMe.changesRequested.length + needsMe.regressions.length;
  return (
    <View style={styles.panel} testID="needs-me">
      <SkText variant="heading" accessibilityRole="header">
        {total > 0 ? `Waiting for you: ${total}` : '✓ Nothing is waiting for you'}
      </SkText>
      {needsMe.reviewQueue ? (
        <Group title="Suites to review" count={needsMe.reviewQueue.length} empty="No suite is waiting for review.">
          {needsMe.reviewQueue.map((s) => (
            <Row key={`${s.slug}-${s.version}`} href={`/review/${encodeURIComponent(s.slug)}`}>
              <SkText variant="label">{suiteLine(s)}</SkText>
              <SkText variant="caption">
                by {s.authorName}, submitted {formatWhen(s.since, now)}
              </SkText>
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
            <Row key={`${s.slug}-${s.version}`} href={`/suites/${encodeURIComponent(s.slug)}`}>
              <SkText variant="label">↩ {suiteLine(s)}</SkText>
              <SkText variant="caption">
                changes requested by {s.reviewerName ?? 'a reviewer'}, {formatWhen(s.since, now)}
              </SkText>
              {s.reviewComment ? (
                <SkText variant="caption" tone="ink" style={styles.quote}>
                  “{s.reviewComment}”
                </SkText>
              ) : null}
            </Row>
          ))}
        </Group>
      ) : null}
      <Group title="Regressions for you" count={needsMe.regressions.length} empty={regressionsEmpty(needsMe)}>
        {needsMe.regressions.map((r) => {
          const where = r.targetKey === null ? `in ${r.planName}` : `on ${r.targetKey}`;
          return (
            <Row key={`${r.runId}-${r.targetKey ?? 'plan'}`} href={regressionsHref(r.runId)}>
              <SkText variant="label" style={styles.danger}>
                {COMPARISON_WORDS.regressions(r.count)} {where}:{' '}
                {r.branch === 0 ? 'accuracy only' : CLASS_WORDS.map((c) => `${countOf(r, c.key)} ${c.key}`).join(', ')}
              </SkText>
              <SkText variant="caption">
                {r.targetKey === null
                  ? `You receive this plan's regression mail · finished ${formatWhen(r.finishedAt, now)}`
                  : `${r.planName}, finished ${formatWhen(r.finishedAt, now)} · you subscribe to ${r.targetKey}`}
              </SkText>
            </Row>
          );
        })}
      </Group>
    </View>
  );
}

/** Why nothing is listed: what the caller follows, and where to change it. */
function regressionsEmpty(needsMe: NeedsMe): string {
  const followed = [
    needsMe.mailPlans.length ? `the plans that mail you (${needsMe.mailPlans.join(', ')})` : null,
    needsMe.subscriptions.length ? `your libraries (${needsMe.subscriptions.join(', ')})` : null,
  ].filter((p) => p !== null);
  return followed.length
    ? `No regressions in the latest completed runs of ${followed.join(' or on ')}.`
    : 'No plan mails you its regressions and you subscribe to no library (Settings).';
}

/** A regression count's branch or accuracy part (the overview sends the branch part and the whole). */
const countOf = (r: WaitingRegression, c: DiagnosisClass) => (c === 'branch' ? r.branch : r.count - r.branch);

const styles = StyleSheet.create({
  panel: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(4),
  },
  group: { gap: theme.space(1) },
  groupTitle: { textTransform: 'uppercase', letterSpacing: 0.8 },
  count: { fontFamily: theme.font.mono },
  empty: { paddingVertical: theme.space(1) },
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
  quote: { fontStyle: 'italic' },
  danger: { color: theme.color.danger },
});
