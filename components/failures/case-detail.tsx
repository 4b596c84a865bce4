import { Link } from 'expo-router';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import type { ReactNode } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { useFailure } from '../../client/use-failure';
import { useMe } from '../../client/use-me';
import { theme } from '../../constants/theme';
import { FormulaText } from '../ui/formula-text';
import { SkText } from '../ui/sk-text';
import { CasePictures } from './case-pictures';
import { ClassifyForm } from './classify-form';
import { describeFailure } from './describe-failure';
import { AccuracyParts } from './accuracy-parts';
import { DiagnosisLabel } from './diagnosis-label';
import { DisagreementValues } from './disagreement-values';
import { LabelChips } from './label-chips';
import { StepsTable } from './steps-table';
import { DIAGNOSIS_STYLES } from './diagnosis-styles';
import { FailureHistory } from './failure-history';
import { QueryState } from '../ui/query-state';
import { CaseDecisions } from '../decisions/case-decisions';
import { ReproducerBox } from './reproducer-box';
import { ValueBits } from './value-bits';

/**
 * One failing case: every label of the point, where on the plane it failed and what the path did
 * around it, the values with their exact bits and both one-sided limits, how far off an
 * inaccurate value is per part, both values of a disagreement, a composed subject's steps, a
 * convention choice, the rule that fixes the expected value, a
 * reproducer, the decisions that cover it, the point's history, and a verdict for those who may give one.
 */
export function CaseDetail({ id }: { id: string }) {
  const detail = useFailure(id);
  const me = useMe();
  const wide = useWindowDimensions().width >= theme.wide;
  if (detail.isPending) return <QueryState state="loading" />;
  if (detail.isError)
    return <QueryState state="error" message={detail.error.message} onRetry={() => void detail.refetch()} />;
  const { failure: f, history, decisions, targetKey, targetVersion } = detail.data;
  const { tone } = describeFailure(f);
  const labels = f.labels.length > 0 ? f.labels : f.diagnosis ? [f.diagnosis] : [];
  const inaccurate = labels.find((l) => l.kind === 'inaccurate');
  const disagreement = labels.find((l) => l.kind === 'disagreement');
  const role = me.data?.role;
  const mayClassify = role === 'reviewer' || role === 'admin' || role === 'maintainer';

  const facts = (
    <>
      <Section title="Values">
        <ValueBits failure={f} />
      </Section>
      {inaccurate ? (
        <Section title="How far off">
          <AccuracyParts label={inaccurate} />
        </Section>
      ) : null}
      {disagreement ? (
        <Section title="Two ways, two values">
          <DisagreementValues
            label={disagreement}
            subject="this suite's subject"
            actual={f.actual}
            expected={f.expected}
          />
        </Section>
      ) : null}
      {f.steps && f.steps.length > 0 ? (
        <Section title="Step by step">
          <StepsTable steps={f.steps} firstLeft={f.firstLeftStep ?? null} />
        </Section>
      ) : null}
      {f.choice ? (
        <Section title="A convention choice">
          <SkText variant="body" testID="choice">
            {f.choice}
          </SkText>
          <SkText variant="caption" style={styles.small}>
            Conventions disagree about the value at this point. The expected value follows the rule above; a library
            that documents another rule here is making a different choice, not an error in its arithmetic.
          </SkText>
        </Section>
      ) : null}
      <Section title="Rule">
        <Text style={styles.rule} testID="case-rule">
          {f.rule ? <FormulaText text={f.rule} size={14} /> : '—'}
        </Text>
        <SkText variant="caption" style={styles.small}>
          Judged under the {f.convention} convention with suite {f.suiteSlug} v{f.suiteVersion}.{' '}
          {DIAGNOSIS_STYLES[tone].word[0]!.toUpperCase() + DIAGNOSIS_STYLES[tone].word.slice(1)}:{' '}
          {DIAGNOSIS_STYLES[tone].explain}.
        </SkText>
      </Section>
      <Section title="Reproducer">
        {f.reproducer ? (
          <ReproducerBox code={f.reproducer} />
        ) : (
          <SkText variant="caption" style={styles.small}>
            No reproducer was stored for this point.
          </SkText>
        )}
      </Section>
      <Section title="Decisions on this failure">
        <CaseDecisions decisions={decisions} failureId={f.id} />
      </Section>
      <Section title="History of this point">
        <FailureHistory history={history} currentId={f.id} />
      </Section>
      {mayClassify && role ? (
        <Section title={role === 'maintainer' ? 'Accept a deviation' : 'Verdict'}>
          <ClassifyForm
            failure={{
              id: f.id,
              targetKey,
              targetVersion,
              suiteSlug: f.suiteSlug,
              pathName: f.pathName,
              diagnosisKind: f.diagnosis?.kind ?? null,
            }}
            role={role}
          />
        </Section>
      ) : null}
    </>
  );

  return (
    <View style={styles.root}>
      <View style={styles.head}>
        {labels.length > 0 ? <LabelChips labels={labels} details /> : <DiagnosisLabel tone={tone} />}
        {labels.length > 1 ? (
          <SkText variant="caption" style={styles.small}>
            {labels.length} labels apply to this point; the first leads, branch labels before accuracy.
          </SkText>
        ) : null}
        <Text style={styles.where}>
          {f.suiteSlug} v{f.suiteVersion} · {f.targetName} · {f.convention}
        </Text>
        <SkText variant="caption" style={styles.small}>
          Path {f.pathName}
          {f.label ? ` · ${f.label}` : ''} · index {f.pointIndex} · t = {Number(f.t.toPrecision(6))}
          {f.isRegression ? ` · ${COMPARISON_WORDS.regressionMark}: ${COMPARISON_WORDS.regressionMeaning}` : ''}
        </SkText>
        <Link href={{ pathname: '/failures', params: { run: f.runId } }} asChild>
          <Pressable
            accessibilityRole="link"
            accessibilityLabel="All failures of this run"
            style={StyleSheet.flatten(styles.back)}
          >
            <SkText variant="label" tone="accent">
              ← All failures of this run
            </SkText>
          </Pressable>
        </Link>
      </View>
      <View style={wide ? styles.columns : styles.stack}>
        <View style={wide ? styles.left : undefined}>
          <Section title="Where on the plane">
            <CasePictures failureId={f.id} />
          </Section>
        </View>
        <View style={[styles.stack, wide ? styles.right : undefined]}>{facts}</View>
      </View>
    </View>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <View style={styles.section}>
      <SkText variant="heading" accessibilityRole="header" aria-level={2}>
        {title}
      </SkText>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(5) },
  head: { gap: theme.space(2) },
  where: { fontFamily: theme.font.medium, fontSize: theme.size.large, color: theme.color.ink },
  small: { lineHeight: 19 },
  back: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
  columns: { flexDirection: 'row', gap: theme.space(6), alignItems: 'flex-start' },
  stack: { gap: theme.space(5) },
  left: { flex: 3, minWidth: 0 },
  right: { flex: 2, minWidth: 0 },
  section: { gap: theme.space(3) },
  rule: { fontFamily: theme.font.mono, fontSize: 14, color: theme.color.ink, lineHeight: 20 },
});
