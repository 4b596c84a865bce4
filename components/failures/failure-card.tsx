import { Link } from 'expo-router';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { FailureView } from '../../shared/failure-view';
import { SkText } from '../ui/sk-text';
import { describeFailure } from './describe-failure';
import { formatComplexText } from '../../shared/format-complex-text';
import { DiagnosisLabel } from './diagnosis-label';
import { DIAGNOSIS_STYLES } from './diagnosis-styles';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

/** One failure on a phone: the diagnosis first, then where it happened and the values, the whole card a link to the case. */
export function FailureCard({ failure: f }: { failure: FailureView }) {
  const { tone, detail } = describeFailure(f);
  return (
    <Link href={`/failures/${f.id}`} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={`Failure ${f.id}: ${DIAGNOSIS_STYLES[tone].word} in ${f.suiteSlug} on ${f.targetName}, path ${f.pathName}`}
        style={StyleSheet.flatten(styles.card)}
        testID={`failure-card-${f.id}`}
      >
        <View style={styles.top}>
          <DiagnosisLabel tone={tone} detail={detail} />
          <SkText variant="smallLabel">
            #{f.id}
            {f.isRegression ? ' · ↑ new' : ''}
          </SkText>
        </View>
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
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(2),
    minHeight: theme.touch,
  },
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
