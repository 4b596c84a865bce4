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

/** A destructive action in two steps on the spot, so one stray tap never deletes or revokes. */
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
  if (!asking)
    return (
      <ActionButton
        label={label}
        accessibilityLabel={accessibilityLabel}
        tone="quiet"
        onPress={() => setAsking(true)}
        busy={busy}
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
        <ActionButton label={keepLabel} tone="quiet" onPress={() => setAsking(false)} />
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
