import { useState } from 'react';
import { Platform, Pressable, StyleSheet, Text, View } from 'react-native';
import { canEditPlans } from '../../client/can-edit-plans';
import { usePlans } from '../../client/use-plans';
import { theme } from '../../constants/theme';
import type { Role } from '../../shared/roles';
import { SkText } from '../ui/sk-text';
import { CHOICE_CHIP_STYLE } from '../ui/choice-chip-style';
import { RadioMark } from '../ui/radio-mark';
import { useRadioKeys } from '../ui/use-radio-keys';

/** The server's address as this browser reaches it; a placeholder elsewhere. */
const origin =
  Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : 'https://sheetkeeper.example';

/**
 * How to use a token in CI: start a plan's run through the API with the `Authorization: Bearer`
 * header (server/middleware/token-auth.ts), or check a suite inside the job with the command line.
 */
export function CiExample({ role }: { role: Role }) {
  const plans = usePlans();
  const [chosen, setChosen] = useState<string | null>(null);
  const plan = plans.data?.find((p) => p.id === chosen) ?? plans.data?.[0];
  const planRadio = useRadioKeys(
    plans.data?.length ?? 0,
    plans.data?.findIndex((p) => p.id === plan?.id) ?? -1,
    (index) => {
      const next = plans.data?.[index];
      if (next) setChosen(next.id);
    },
  );
  const planId = plan?.id ?? '<plan id from the plan’s page>';
  const mayStart = canEditPlans(role);

  const curl = [
    `# Start a run of “${plan?.name ?? 'a plan'}”.`,
    `# The answer (202) is the queued run as JSON.`,
    `curl --fail -X POST "${origin}/api/runs" \\`,
    `  -H "Authorization: Bearer $SHEETKEEPER_TOKEN" \\`,
    `  -H "Content-Type: application/json" \\`,
    `  -d '{"planId": "${planId}"}'`,
    ``,
    `# Follow it until its status is completed, failed or cancelled:`,
    `curl --fail -H "Authorization: Bearer $SHEETKEEPER_TOKEN" "${origin}/api/runs/<run id>"`,
  ].join('\n');
  const cli = [
    `# Or check a suite inside the CI job itself (no token, no server):`,
    `npx sheetkeeper run --suite suites/demo/sqrt-principal-sz.json \\`,
    `  --target complex.js@2.4.3 --format junit --out sheetkeeper.xml`,
    `# exit 0: nothing failed · 1: something failed · 2: bad input`,
  ].join('\n');

  return (
    <View style={styles.box} testID="ci-example">
      <SkText variant="caption" style={styles.text}>
        Keep the token in your CI&apos;s secret store as <Text style={styles.inline}>SHEETKEEPER_TOKEN</Text>. It acts
        as you, with your role
        {mayStart ? '.' : ': starting runs needs the maintainer or admin role, so ask one of them for a plan run.'}
      </SkText>
      {plans.data && plans.data.length > 1 ? (
        <View style={styles.chips} accessibilityRole="radiogroup" accessibilityLabel="Plan in the example">
          {plans.data.map((p, index) => (
            <Pressable
              key={p.id}
              {...planRadio(index)}
              accessibilityRole="radio"
              aria-checked={p.id === plan?.id}
              accessibilityLabel={`Use plan ${p.name} in the example`}
              style={[styles.chip, p.id === plan?.id && styles.chipOn]}
            >
              <RadioMark on={p.id === plan?.id} />
              <SkText variant="caption" tone="ink" style={p.id === plan?.id && styles.chipTextOn}>
                {p.name}
              </SkText>
            </Pressable>
          ))}
        </View>
      ) : null}
      <Text selectable style={styles.code} testID="ci-example-curl">
        {curl}
      </Text>
      <Text selectable style={styles.code}>
        {cli}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  text: { lineHeight: 20 },
  inline: { fontFamily: theme.font.mono, color: theme.color.ink },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: CHOICE_CHIP_STYLE,
  chipOn: { backgroundColor: theme.color.accentSoft, borderColor: theme.color.accent },
  chipTextOn: { fontFamily: theme.font.medium, color: theme.color.accent },
  code: {
    fontFamily: theme.font.mono,
    fontSize: 12,
    lineHeight: 18,
    color: theme.color.navInk,
    backgroundColor: theme.color.nav,
    padding: theme.space(3),
    borderRadius: theme.radius,
    whiteSpace: 'pre-wrap',
    wordBreak: 'break-word',
  } as object,
});
