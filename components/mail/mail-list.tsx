import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { useOutbox } from '../../client/use-outbox';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { QueryState } from '../ui/query-state';
import { ColumnHead } from '../ui/column-head';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

/** What the local mail server received, newest first: cards on a phone, rows on a wide screen. */
export function MailList() {
  const outbox = useOutbox();
  const wide = useWindowDimensions().width >= theme.wide;
  if (outbox.isPending) return <QueryState state="loading" />;
  if (outbox.isError)
    return <QueryState state="error" message={outbox.error.message} onRetry={() => void outbox.refetch()} />;
  const messages = outbox.data.pages.flatMap((p) => p.messages);
  if (messages.length === 0)
    return (
      <QueryState
        state="empty"
        message="No mail received yet. Regression mail appears here once a run finds a regression."
      />
    );

  return (
    <View style={styles.list} testID="mail-list">
      {wide ? (
        <View style={[styles.row, styles.headRow]}>
          <ColumnHead style={styles.whenCol}>Received</ColumnHead>
          <ColumnHead style={styles.subjectCol}>Subject</ColumnHead>
          <ColumnHead style={styles.peopleCol}>From → to</ColumnHead>
        </View>
      ) : null}
      {messages.map((m) => (
        <Link key={m.id} href={`/outbox/${m.id}`} asChild>
          <Pressable accessibilityRole="link" style={StyleSheet.flatten(wide ? styles.row : styles.card)}>
            {wide ? (
              <>
                <SkText variant="caption" style={styles.whenCol}>
                  {formatDate(m.receivedAt)}
                </SkText>
                <SkText variant="label" style={styles.subjectCol} numberOfLines={2}>
                  {m.subject || '(no subject)'}
                </SkText>
                <Text style={[styles.people, styles.peopleCol]} numberOfLines={2}>
                  {m.from} → {m.to.join(', ')}
                </Text>
              </>
            ) : (
              <>
                <SkText variant="label">{m.subject || '(no subject)'}</SkText>
                <Text style={styles.people} numberOfLines={2}>
                  To {m.to.join(', ')}
                </Text>
                <Text style={styles.people} numberOfLines={1}>
                  From {m.from}
                </Text>
                <SkText variant="caption">{formatDate(m.receivedAt)}</SkText>
              </>
            )}
          </Pressable>
        </Link>
      ))}
      {outbox.hasNextPage ? (
        <ActionButton
          label="Older messages"
          tone="quiet"
          busy={outbox.isFetchingNextPage}
          onPress={() => void outbox.fetchNextPage()}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(1),
  },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    minHeight: theme.touch,
    paddingVertical: theme.space(3),
    paddingHorizontal: theme.space(3),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
    backgroundColor: theme.color.panel,
  },
  headRow: { backgroundColor: 'transparent', minHeight: 0 },
  whenCol: { width: 170 },
  subjectCol: { flex: 3 },
  peopleCol: { flex: 2 },
  people: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
});
