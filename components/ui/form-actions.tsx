import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from './action-button';
import { FailureAlert } from './failure-alert';

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
      {failure ? <FailureAlert message={failure} /> : null}
      <View style={styles.buttons}>
        <ActionButton label={saveLabel} onPress={onSave} busy={busy} />
        <ActionButton label="Cancel" tone="quiet" onPress={onCancel} />
      </View>
    </>
  );
}

const styles = StyleSheet.create({
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
