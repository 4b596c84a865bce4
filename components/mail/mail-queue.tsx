import { StyleSheet, Text, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { useMailQueue } from '../../client/use-mail-queue';
import { theme } from '../../constants/theme';
import { MAIL_MAX_ATTEMPTS } from '../../shared/mail-max-attempts';
import type { OutboxMailStatus } from '../../shared/outbox-mail-status';
import type { OutboxMailView } from '../../shared/outbox-mail-view';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';

/** Each state in words (never colour alone), and the tone that goes with it. */
const STATES: Record<Exclude<OutboxMailStatus, 'sent'>, { word: string; tone: 'ink' | 'warn' | 'danger' }> = {
  pending: { word: '… Waiting to send', tone: 'ink' },
  sending: { word: '↻ Being handed to the mail relay', tone: 'ink' },
  unconfirmed: { word: '? May have arrived, not sent again', tone: 'warn' },
  failed: { word: '× Not delivered', tone: 'danger' },
};

const explain = (m: OutboxMailView): string => {
  if (m.status === 'pending')
    return m.attempts === 0
      ? `Goes out within seconds.`
      : `Attempt ${m.attempts + 1} of ${MAIL_MAX_ATTEMPTS} at ${formatDate(m.nextAttemptAt)}. Last try: ${m.lastError ?? 'no reason given'}`;
  if (m.status === 'sending') return `Attempt ${m.attempts} of ${MAIL_MAX_ATTEMPTS}.`;
  return m.lastError ?? 'No reason was recorded.';
};

/**
 * Mail Sheetkeeper queued that has not reached the mail relay, or not surely: what is waiting,
 * what is being sent, what may have arrived without the relay confirming it (not sent again, so
 * nobody gets two copies), and what failed after the capped attempts, each with its reason.
 */
export function MailQueue() {
  const queue = useMailQueue();
  if (queue.isPending) return <QueryState state="loading" />;
  if (queue.isError)
    return <QueryState state="error" message={queue.error.message} onRetry={() => void queue.refetch()} />;
  if (queue.data.length === 0) return null;
  return (
    <View style={styles.list} testID="mail-queue">
      <SkText variant="heading" accessibilityRole="header">
        Not delivered yet
      </SkText>
      {queue.data.map((m) => {
        const state = STATES[m.status as keyof typeof STATES];
        return (
          <View key={m.id} style={styles.card} accessibilityLabel={`${m.subject}: ${state.word}`}>
            <SkText variant="strong" tone={state.tone}>
              {state.word}
            </SkText>
            <SkText variant="label">{m.subject || '(no subject)'}</SkText>
            <Text style={styles.people} numberOfLines={2}>
              To {m.recipients.join(', ')} · queued {formatDate(m.createdAt)}
            </Text>
            <SkText variant="caption" tone="ink">
              {explain(m)}
            </SkText>
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2), marginBottom: theme.space(4) },
  card: { ...PANEL_BOX_STYLE, gap: theme.space(1) },
  people: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
});
