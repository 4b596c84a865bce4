import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from './action-button';

/** The foot of a form: a refusal that names no field, then save and cancel. */
export function FormActions({
  failure,
  saveLabel,
  onSave,
  busy,
  onCancel,
}: {
  failure?: string | null;
  saveLabel: string;
  onSave: () => void;
  busy: boolean;
  onCancel: () => void;
}) {
  return (
    <>
      {failure ? (
        <Text accessibilityRole="alert" style={styles.failure}>
          ❌ {failure}
        </Text>
      ) : null}
      <View style={styles.buttons}>
        <ActionButton label={saveLabel} onPress={onSave} busy={busy} />
        <ActionButton label="Cancel" tone="quiet" onPress={onCancel} />
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  failure: {
    fontFamily: theme.font.medium,
    color: theme.color.danger,
    backgroundColor: theme.color.dangerSoft,
    padding: theme.space(3),
    borderRadius: theme.radius,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
