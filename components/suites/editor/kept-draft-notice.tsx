import { StyleSheet, View } from 'react-native';
import { formatDate } from '../../../client/format-date';
import { theme } from '../../../constants/theme';
import { SkText } from '../../ui/sk-text';
import { SmallButton } from '../../ui/small-button';

/** Offers the unsaved work this device kept for a form: bring it back, or throw it away. */
export function KeptDraftNotice({
  savedAt,
  onRestore,
  onDiscard,
}: {
  savedAt: string;
  onRestore: () => void;
  onDiscard: () => void;
}) {
  return (
    <View style={styles.box} accessibilityRole="summary" testID="kept-draft-notice">
      <SkText variant="body">
        This device kept work on this form that was never saved, last changed {formatDate(savedAt)}. Restoring it
        replaces what the form shows now.
      </SkText>
      <View style={styles.buttons}>
        <SmallButton label="Restore it" onPress={onRestore} />
        <SmallButton label="Discard it" onPress={onDiscard} danger />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: theme.color.warnSoft,
    borderRadius: theme.radius,
    padding: theme.space(3),
    gap: theme.space(2),
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
