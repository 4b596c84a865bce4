import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useReviewSuite } from '../../client/use-review-suite';
import { theme } from '../../constants/theme';
import { reviewBody } from '../../shared/schemas/review-body';
import { ActionButton } from '../ui/action-button';
import { ChipGroup } from '../ui/chip-group';
import { FormTextInput } from '../ui/form-text-input';
import { SkText } from '../ui/sk-text';

type Decision = 'approve' | 'request-changes';

/**
 * Approve a submitted version, or request changes saying what to change. Nothing is chosen at
 * first: a reviewer decides on purpose, and sending without a choice asks for one. The server's
 * refusal (four eyes, a stored version that breaks today's rules) is shown as it says it.
 */
export function ReviewForm({
  slug,
  version,
  onReviewed,
}: {
  slug: string;
  version: number;
  onReviewed: (decision: Decision) => void;
}) {
  const [decision, setDecision] = useState<Decision | undefined>(undefined);
  const [comment, setComment] = useState('');
  const [tried, setTried] = useState(false);
  const review = useReviewSuite();
  const parsed = reviewBody.safeParse({ decision, comment });
  const faulted = (field: string) =>
    tried && !parsed.success ? parsed.error.issues.filter((i) => i.path[0] === field) : [];
  const clientRules = faulted('comment').map((i) => i.message);
  const unchosen = faulted('decision').length > 0;
  const error =
    review.error instanceof ApiRequestError
      ? review.error.body
      : review.error
        ? { kind: 'server-error' as const, message: review.error.message }
        : null;
  const serverRules =
    error?.kind === 'invalid-input' ? error.issues.filter((i) => i.field === 'body.comment').map((i) => i.rule) : [];

  const send = () => {
    setTried(true);
    if (!parsed.success) return;
    review.mutate({ slug, version, body: parsed.data }, { onSuccess: () => onReviewed(parsed.data.decision) });
  };

  return (
    <View style={styles.box}>
      <ChipGroup
        label="Decision"
        options={[
          { value: 'approve', text: 'approve' },
          { value: 'request-changes', text: 'request changes' },
        ]}
        value={decision}
        onChange={setDecision}
      />
      {unchosen ? (
        <SkText variant="label" tone="danger" accessibilityRole="alert" testID="review-unchosen">
          × Choose a decision first: approve, or request changes.
        </SkText>
      ) : null}
      <FormTextInput
        label="Comment"
        hint={
          decision === 'request-changes'
            ? 'required: what to change'
            : decision === 'approve'
              ? 'optional: what you checked'
              : 'optional when approving, required when requesting changes'
        }
        value={comment}
        onChangeText={setComment}
        rules={[...clientRules, ...serverRules]}
        multiline
      />
      {error && error.kind !== 'invalid-input' ? (
        <SkText variant="label" tone="danger" accessibilityRole="alert" style={styles.refusal} testID="review-refusal">
          × {error.message}
        </SkText>
      ) : null}
      <ActionButton
        label={
          decision === 'approve'
            ? `Approve version ${version}`
            : decision === 'request-changes'
              ? `Request changes to version ${version}`
              : `Send the decision on version ${version}`
        }
        onPress={send}
        busy={review.isPending}
      />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  refusal: { backgroundColor: theme.color.dangerSoft, padding: theme.space(3), borderRadius: theme.radius },
});
