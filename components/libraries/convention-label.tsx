import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';
import { CONVENTION_STYLES, type Behaviour } from './convention-styles';

/** A fingerprint verdict as a glyph and a word on an outlined chip: readable without the colour. */
export function ConventionLabel({ behaviour, prefix }: { behaviour: Behaviour; prefix?: string }) {
  const style = CONVENTION_STYLES[behaviour];
  return (
    <View
      style={[styles.chip, { borderColor: style.color }]}
      accessibilityLabel={`${prefix ? `${prefix} ` : ''}${style.word}`}
    >
      <Text style={[styles.glyph, { color: style.color }]}>{style.glyph}</Text>
      <SkText variant="smallLabel" tone="ink">
        {prefix ? <Text style={styles.prefix}>{prefix} </Text> : null}
        {style.word}
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  chip: {
    flexDirection: 'row',
    alignItems: 'center',
    alignSelf: 'flex-start',
    gap: theme.space(1),
    borderWidth: 1.5,
    borderRadius: 999,
    paddingHorizontal: theme.space(2),
    paddingVertical: 2,
    backgroundColor: theme.color.panel,
  },
  glyph: { fontFamily: theme.font.bold, fontSize: theme.size.body, lineHeight: 20 },
  prefix: { fontFamily: theme.font.regular, color: theme.color.inkSoft },
});
