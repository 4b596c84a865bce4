import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from './action-button';
import { SkText } from './sk-text';

interface Props {
  /** The button that asks, e.g. "Revoke". */
  label: string;
  /** The accessible name of that button, e.g. "Revoke token ci-main". */
  accessibilityLabel: string;
  /** The question asked before doing it. */
  question: string;
  /** The button that does it, e.g. "Yes, revoke". */
  confirmLabel: string;
  /** The button that does nothing; "Cancel" unless the action is itself a cancelling, e.g. "Keep the invitation". */
  keepLabel?: string;
  onConfirm: () => void;
  busy?: boolean;
}

/**
 * A destructive action in two steps on the spot, so one stray tap never deletes or revokes. The
 * question replaces the button that asked, so the focus moves with it: onto the way back (the
 * harmless answer, so a second Enter does nothing it would regret), and onto the asking button
 * again when the way back is taken. The question is also a polite live region, read when it appears.
 */
export function ConfirmAction({
  label,
  accessibilityLabel,
  question,
  confirmLabel,
  keepLabel = 'Cancel',
  onConfirm,
  busy = false,
}: Props) {
  const [asking, setAsking] = useState(false);
  // Whether the person came back from the question: only then does the asking button take the focus.
  const [keptBack, setKeptBack] = useState(false);
  if (!asking)
    return (
      <ActionButton
        label={label}
        accessibilityLabel={accessibilityLabel}
        tone="quiet"
        onPress={() => setAsking(true)}
        busy={busy}
        focusOnMount={keptBack}
      />
    );
  return (
    <View style={styles.box} accessibilityLiveRegion="polite">
      <SkText variant="label" tone="danger">
        {question}
      </SkText>
      <View style={styles.buttons}>
        <ActionButton
          label={confirmLabel}
          onPress={() => {
            setAsking(false);
            onConfirm();
          }}
        />
        <ActionButton
          label={keepLabel}
          tone="quiet"
          focusOnMount
          onPress={() => {
            setKeptBack(true);
            setAsking(false);
          }}
        />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: theme.space(2),
    padding: theme.space(3),
    borderRadius: theme.radius,
    backgroundColor: theme.color.dangerSoft,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
