import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';
import { OPENED_EXISTING_PARAM } from '../../client/opened-existing-param';
import { refusalMessage } from '../../client/refusal-message';
import { useStartRun } from '../../client/use-start-run';
import { theme } from '../../constants/theme';
import { ActionButton } from '../ui/action-button';
import { SkText } from '../ui/sk-text';

/**
 * "Run now" for a plan: queues a run and opens it; when the plan has a run queued or running
 * already, opens that one and the run page says so. A refusal shows beside the button.
 */
export function StartRunButton({
  planId,
  planName,
  tone = 'primary',
}: {
  planId: string;
  planName: string;
  tone?: 'primary' | 'quiet';
}) {
  const router = useRouter();
  const start = useStartRun();
  const failure = refusalMessage(start.error, 'The server could not be reached; no run was started.');
  return (
    <View style={styles.box}>
      <ActionButton
        label="Run now"
        accessibilityLabel={`Run now: ${planName}`}
        tone={tone}
        busy={start.isPending}
        onPress={() =>
          start.mutate(planId, {
            onSuccess: ({ run, existing }) =>
              router.push(`/runs/${run.id}${existing ? `?${OPENED_EXISTING_PARAM}=1` : ''}`),
          })
        }
      />
      {failure ? (
        <SkText variant="caption" tone="danger" accessibilityRole="alert">
          ❌ {failure}
        </SkText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(2) },
});
