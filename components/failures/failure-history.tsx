import { Link } from 'expo-router';
import { COMPARISON_WORDS } from '../../shared/comparison-words';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { FailureDetailView } from '../../shared/failure-detail-view';
import { SkText } from '../ui/sk-text';
import { DIAGNOSIS_STYLES } from './diagnosis-styles';
import { DiagnosisLabel } from './diagnosis-label';

/** The same point (suite, path, input bits) in every run that failed it, newest first, across targets and versions. */
export function FailureHistory({ history, currentId }: { history: FailureDetailView['history']; currentId: string }) {
  if (history.length <= 1)
    return (
      <SkText variant="caption" style={styles.note}>
        This point has failed in this run only; the runs before it passed it or did not check it.
      </SkText>
    );
  return (
    <View style={styles.list}>
      <SkText variant="caption" style={styles.note}>
        Runs in which this point failed. A run that passed it is not listed.
      </SkText>
      {history.map((h) => {
        const current = h.id === currentId;
        const when = `${new Date(h.runAt).toISOString().slice(0, 16).replace('T', ' ')} UTC`;
        const mark = current ? 'this case' : h.isRegression ? `${COMPARISON_WORDS.regressionMark} in that run` : '';
        const body = (
          <>
            <Text style={styles.when}>{when}</Text>
            <SkText variant="smallLabel" tone="ink">
              {h.targetName}
            </SkText>
            <DiagnosisLabel tone={h.diagnosisKind ?? 'error'} />
            <SkText variant="caption">{mark}</SkText>
          </>
        );
        return current ? (
          <View key={h.id} style={[styles.row, styles.current]} aria-current="page">
            {body}
          </View>
        ) : (
          <Link key={h.id} href={`/failures/${h.id}`} asChild>
            <Pressable
              accessibilityRole="link"
              // "Failure …", then the row's words in order (WCAG 2.5.3, label in name).
              accessibilityLabel={`Failure ${h.id}: ${when} ${h.targetName} ${DIAGNOSIS_STYLES[h.diagnosisKind ?? 'error'].word} ${mark}`.trim()}
              style={StyleSheet.flatten(styles.row)}
            >
              {body}
            </Pressable>
          </Link>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  note: { lineHeight: 19 },
  row: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    gap: theme.space(3),
    minHeight: theme.touch,
    paddingVertical: theme.space(2),
    paddingHorizontal: theme.space(3),
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderRadius: theme.radius,
    backgroundColor: theme.color.panel,
  },
  current: { borderColor: theme.color.focus, borderWidth: 2 },
  when: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
});
