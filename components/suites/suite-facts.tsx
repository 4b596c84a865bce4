import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { describeTolerance } from '../../shared/describe-tolerance';
import type { Suite } from '../../shared/schemas/suite-schema';
import { FormulaText } from '../ui/formula-text';
import { SkText } from '../ui/sk-text';
import { describeSuitePath } from './describe-suite-path';
import { formatComplexText } from '../../shared/format-complex-text';

/**
 * One field in words; `formula` sets it as maths (FormulaText), `mono` as code to copy, `typed`
 * as a formula shown as typed and said as maths (a subject).
 */
function Fact({
  label,
  children,
  mono = false,
  formula = false,
  typed = false,
}: {
  label: string;
  children: string;
  mono?: boolean;
  formula?: boolean;
  typed?: boolean;
}) {
  return (
    <View style={styles.fact}>
      <SkText variant="smallLabel" tone="inkFaint" style={styles.label}>
        {label}
      </SkText>
      <SkText variant="body" style={[styles.value, mono && styles.mono]}>
        {formula || typed ? <FormulaText text={children} size={theme.size.body} typed={typed} /> : children}
      </SkText>
    </View>
  );
}

/** What a suite version checks, field by field, in words. */
export function SuiteFacts({ suite }: { suite: Suite }) {
  const b = suite.branch;
  return (
    <View style={styles.box}>
      <Fact label="Subject" mono typed>
        {suite.subject}
      </Fact>
      {b.kind === 'principal' ? (
        <Fact label="Branch">principal branch of every function in the subject</Fact>
      ) : (
        <>
          <Fact label="Branch" formula>
            {`regular branch of (${b.g})^{${typeof b.nu === 'string' ? b.nu : formatComplexText(b.nu)}}`}
          </Fact>
          <Fact label="Fixed by" formula>
            {b.f0
              ? `f(${formatComplexText(b.z0)}) = ${formatComplexText(b.f0)}`
              : `value k = ${b.k} at z0 = ${formatComplexText(b.z0)} (the principal value times e^{2πiνk})`}
          </Fact>
          <Fact label="Cut layout" mono>
            {b.cuts.length === 0
              ? 'no cuts'
              : b.cuts
                  .map(
                    (cut, i) =>
                      `${i + 1}. ${cut.points.map((z) => formatComplexText(z)).join(' → ')}${cut.to_infinity ? ' → ∞' : ''}`,
                  )
                  .join('\n')}
          </Fact>
        </>
      )}
      <Fact label="Convention">
        {suite.convention === 'signed-zero'
          ? 'signed zero (IEC 60559 / Annex G): a zero part’s sign picks the side of a cut'
          : 'counter-clockwise continuity: zero signs ignored'}
      </Fact>
      <View style={styles.fact}>
        <SkText variant="smallLabel" tone="inkFaint" style={styles.label}>
          Paths ({suite.paths.length})
        </SkText>
        {suite.paths.map((p) => (
          <SkText variant="body" key={p.name} style={styles.value}>
            • <Text style={styles.strong}>{p.name}</Text>: {describeSuitePath(p)}
          </SkText>
        ))}
      </View>
      <Fact label="Tolerances">
        {[
          `values ${describeTolerance(suite.tolerances.values)}`,
          suite.tolerances.monodromy ? `monodromy ${describeTolerance(suite.tolerances.monodromy)}` : null,
          suite.tolerances.properties ? `properties ${describeTolerance(suite.tolerances.properties)}` : null,
        ]
          .filter(Boolean)
          .join('; ')}
      </Fact>
      <Fact label={`Property checks (${suite.properties.length})`}>
        {suite.properties.length === 0
          ? 'none: this suite checks values only'
          : suite.properties
              .map(
                (p) =>
                  `${p.law}${p.power ? ` (n = ${p.power})` : ''} over ${p.region.kind === 'near-cuts' ? `points within ${p.region.distance} of the cuts` : p.region.kind === 'disc' ? `the disc |z − (${formatComplexText(p.region.center)})| ≤ ${p.region.radius}` : `the box ${formatComplexText(p.region.min)} to ${formatComplexText(p.region.max)}`}, ${p.runs} runs, seed ${p.seed}`,
              )
              .join('\n')}
      </Fact>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(3) },
  fact: { gap: 2 },
  label: { textTransform: 'uppercase', letterSpacing: 0.6 },
  value: { lineHeight: 22 },
  mono: { fontFamily: theme.font.mono, fontSize: 14 },
  strong: { fontFamily: theme.font.medium },
});
