import { StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { fieldLabel } from '../../shared/field-label';
import type { Suite } from '../../shared/schemas/suite-schema';
import { validateSuite } from '../../shared/validate-suite';
import { SkText } from '../ui/sk-text';

/**
 * A version stored before a rule of the suite format existed (a circle of radius -1 that checks
 * nothing), said before the reviewer decides: the server refuses to approve it
 * (server/suites/refuse-broken-body.ts), so the reviewer is told why and that requesting changes
 * is the way on. Nothing shows for a version that meets today's schema.
 */
export function StoredRulesWarning({ body }: { body: Suite }) {
  const checked = validateSuite(body, body.id);
  if (checked.ok) return null;
  return (
    <View style={styles.box} testID="stored-rules-warning">
      <SkText variant="label" tone="warn">
        This version was stored before rules it breaks, so it cannot be approved; request changes and say what to fix:
      </SkText>
      {checked.issues.map((i, k) => (
        <SkText variant="caption" tone="ink" key={k}>
          • {fieldLabel(i.field)} {i.rule}
        </SkText>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    backgroundColor: theme.color.warnSoft,
    padding: theme.space(3),
    borderRadius: theme.radius,
    gap: theme.space(1),
  },
});
