import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { DIAGNOSIS_STYLES, type DiagnosisTone } from './diagnosis-styles';

/** Why a point failed, as a glyph and a word on a tinted chip: readable without the colour. */
export function DiagnosisLabel({ tone, detail }: { tone: DiagnosisTone; detail?: string }) {
  const style = DIAGNOSIS_STYLES[tone];
  return (
    <View
      style={[styles.chip, { borderColor: style.color }]}
      accessibilityLabel={`diagnosis ${style.word}${detail ? `, ${detail}` : ''}`}
    >
      <Text style={[styles.glyph, { color: style.color }]}>{style.glyph}</Text>
      <Text style={[styles.word, { color: style.color }]}>
        {style.word}
        {detail ? <Text style={styles.detail}> {detail}</Text> : null}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: theme.space(1),
    borderWidth: 1,
    borderRadius: 999,
    paddingHorizontal: theme.space(2),
    paddingVertical: 2,
    backgroundColor: theme.color.panel,
  },
  glyph: { fontFamily: theme.font.bold, fontSize: theme.size.small },
  word: { fontFamily: theme.font.medium, fontSize: theme.size.small },
  detail: { fontFamily: theme.font.regular, color: theme.color.inkSoft },
});
