import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useCancelRun } from '../../client/use-cancel-run';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { SkText } from '../ui/sk-text';

/**
 * Cancelling a run, in two steps: the button asks, and says what cancelling does, before
 * anything is sent. The server's refusal (the run finished meanwhile) is shown in place.
 */
export function CancelRunButton({ runId }: { runId: string }) {
  const [asking, setAsking] = useState(false);
  const cancel = useCancelRun(runId);
  const failure = cancel.error instanceof ApiRequestError ? cancel.error.body.message : cancel.error?.message;

  return (
    <View style={styles.box}>
      {asking ? (
        <View style={styles.confirm} accessibilityRole="alert">
          <SkText variant="strong">Cancel this run?</SkText>
          <SkText variant="caption" tone="ink" style={styles.explain}>
            Shards not started are skipped; a shard in progress stops at its next path. Results stored so far stay.
          </SkText>
          <View style={styles.buttons}>
            <ActionButton
              label="Yes, cancel the run"
              busy={cancel.isPending}
              onPress={() => cancel.mutate(undefined, { onSettled: () => setAsking(false) })}
            />
            <ActionButton label="Keep it running" tone="quiet" onPress={() => setAsking(false)} />
          </View>
        </View>
      ) : (
        <ActionButton label="Cancel run…" tone="quiet" onPress={() => setAsking(true)} />
      )}
      {failure ? (
        <Text accessibilityRole="alert" style={styles.failure}>
          × {failure}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2), alignItems: 'flex-start' },
  confirm: {
    alignSelf: 'stretch',
    gap: theme.space(2),
    padding: theme.space(3),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.danger,
    backgroundColor: theme.color.dangerSoft,
  },
  explain: { lineHeight: 20 },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  failure: { fontFamily: theme.font.medium, color: theme.color.danger },
});
