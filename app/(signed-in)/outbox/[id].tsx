import { Link, useLocalSearchParams } from 'expo-router';
import { Pressable, StyleSheet } from 'react-native';
import { useMe } from '../../../client/use-me';
import { useOutboxMessage } from '../../../client/use-outbox-message';
import { MailView } from '../../../components/mail/mail-view';
import { QueryState } from '../../../components/ui/query-state';
import { ScreenBody } from '../../../components/ui/screen-body';
import { SkText } from '../../../components/ui/sk-text';

export default function OutboxMessageScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const { data: me } = useMe();
  const message = useOutboxMessage(String(id));
  if (!me) return null;
  return (
    <ScreenBody pageTitle={message.data ? `Message: ${message.data.subject}` : 'Message'} title="Message">
      <Link href={'/outbox'} asChild>
        <Pressable accessibilityRole="link" accessibilityLabel="All messages" style={StyleSheet.flatten(styles.back)}>
          <SkText variant="label" tone="accent">
            ← All messages
          </SkText>
        </Pressable>
      </Link>
      {me.role !== 'admin' ? <QueryState state="error" message="Only admins can see the outbox." /> : null}
      {me.role === 'admin' && message.isPending ? <QueryState state="loading" /> : null}
      {me.role === 'admin' && message.isError ? (
        <QueryState state="error" message={message.error.message} onRetry={() => void message.refetch()} />
      ) : null}
      {message.data ? <MailView message={message.data} /> : null}
    </ScreenBody>
  );
}

const styles = StyleSheet.create({
  back: { alignSelf: 'flex-start', minHeight: 44, justifyContent: 'center' },
});
