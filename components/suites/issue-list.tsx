import { StyleSheet, Text, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { theme } from '../../constants/theme';
import { fieldLabel } from '../../shared/field-label';
import { FormulaText } from '../ui/formula-text';
import { SkText } from '../ui/sk-text';

/**
 * A refused request, in words: the message, and for invalid input every field with its rule,
 * the field in the form's words ("Path 1 · samples"; `prefix.` is dropped first, e.g. "file."
 * for an uploaded suite).
 */
export function IssueList({ error, prefix = '', testID }: { error: Error | null; prefix?: string; testID?: string }) {
  if (!error) return null;
  const body = error instanceof ApiRequestError ? error.body : null;
  return (
    <View style={styles.box} accessibilityRole="alert" testID={testID}>
      <SkText variant="label" tone="danger">
        × {body?.kind === 'invalid-input' ? 'Refused: the file breaks these rules.' : (body?.message ?? error.message)}
      </SkText>
      {body?.kind === 'invalid-input'
        ? body.issues.map((i, k) => (
            <SkText variant="caption" tone="ink" key={k} style={styles.line}>
              •{' '}
              <Text style={styles.field}>
                {fieldLabel(i.field.startsWith(prefix) ? i.field.slice(prefix.length) : i.field)}
              </Text>{' '}
              <FormulaText text={i.rule} size={theme.size.small} variables={false} />
            </SkText>
          ))
        : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: theme.color.dangerSoft,
    borderRadius: theme.radius,
    padding: theme.space(3),
    gap: theme.space(1),
  },
  line: { lineHeight: 20 },
  field: { fontFamily: theme.font.medium },
});
