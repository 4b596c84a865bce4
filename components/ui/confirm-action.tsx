import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from './action-button';

interface Props {
  /** The button that asks, e.g. "Revoke". */
  label: string;
  /** The accessible name of that button, e.g. "Revoke token ci-main". */
  accessibilityLabel: string;
  /** The question asked before doing it. */
  question: string;
  /** The button that does it, e.g. "Yes, revoke". */
  confirmLabel: string;
  onConfirm: () => void;
  busy?: boolean;
}

/** A destructive action in two steps on the spot, so one stray tap never deletes or revokes. */
export function ConfirmAction({ label, accessibilityLabel, question, confirmLabel, onConfirm, busy = false }: Props) {
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
      <Text style={styles.question}>{question}</Text>
      <View style={styles.buttons}>
        <ActionButton
          label={confirmLabel}
          onPress={() => {
            setAsking(false);
            onConfirm();
          }}
        />
        <ActionButton label="Cancel" tone="quiet" onPress={() => setAsking(false)} />
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
  question: { fontFamily: theme.font.medium, fontSize: theme.size.body, color: theme.color.danger },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
