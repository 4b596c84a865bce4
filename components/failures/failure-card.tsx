import { StyleSheet, Text, View } from 'react-native';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import { theme } from '../../constants/theme';
import type { DecisionMark } from '../../shared/decision-mark';
import type { FailureView } from '../../shared/failure-view';
import { DecisionMarker } from '../decisions/decision-marker';
import { SkText } from '../ui/sk-text';
import { describeFailure } from './describe-failure';
import { formatComplexText } from '../../shared/format-complex-text';
import { DiagnosisLabel } from './diagnosis-label';
import { LabelChips } from './label-chips';
import { LinkCard } from '../ui/link-card';

/** One failure on a phone: every label first (the leading one first), the decision in force on it, then where it happened and the values, the whole card a link to the case. */
export function FailureCard({ failure: f, decision }: { failure: FailureView; decision?: DecisionMark }) {
  const { tone, detail } = describeFailure(f);
  return (
    <LinkCard href={`/failures/${f.id}`} testID={`failure-card-${f.id}`}>
      <View style={styles.top}>
        {f.labels.length > 0 ? (
          <LabelChips labels={f.labels} details />
        ) : (
          <DiagnosisLabel tone={tone} detail={detail} />
        )}
        <SkText variant="smallLabel">
          #{f.id}
          {f.isRegression ? ` · ${COMPARISON_WORDS.regressionMark}` : ''}
        </SkText>
      </View>
      {decision ? <DecisionMarker mark={decision} /> : null}
      <SkText variant="label" numberOfLines={2}>
        {f.suiteSlug} v{f.suiteVersion} · {f.targetName}
      </SkText>
      <SkText variant="caption" numberOfLines={1}>
        {f.pathName}
        {f.label ? ` · ${f.label}` : ''} · t = {Number(f.t.toPrecision(4))}
      </SkText>
      <View style={styles.values}>
        <Text style={styles.value}>z = {formatComplexText(f.z)}</Text>
        <Text style={styles.value}>expected {formatComplexText(f.expected)}</Text>
        <Text style={styles.value}>
          library {'  '}
          {formatComplexText(f.actual)}
        </Text>
      </View>
    </LinkCard>
  );
}

const styles = StyleSheet.create({
  top: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: theme.space(2),
    flexWrap: 'wrap',
  },
  values: { gap: 2 },
  value: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.ink },
});
