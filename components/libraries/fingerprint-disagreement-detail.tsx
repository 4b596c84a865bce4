import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { FingerprintDisagreement, FingerprintSide } from '../../shared/convention-fingerprint';
import { formatComplexText } from '../../shared/format-complex-text';
import { SkText } from '../ui/sk-text';
import { CONVENTION_STYLES } from './convention-styles';

/** "the counter-clockwise value" or "neither convention's value", for one side of a disagreement. */
function followsWords(side: FingerprintSide): string {
  if (side.follows === null) return 'neither convention’s value';
  const s = CONVENTION_STYLES[side.follows];
  return `${s.glyph} the ${s.word} value`;
}

/**
 * Where two functions sharing a cut part ways: the point (with the zero sign at which the
 * conventions differ), each function's library value there, which convention's value it is, and
 * both references, so a reader can check the verdict at one point without the fingerprint's words.
 */
export function FingerprintDisagreementDetail({ cut, d }: { cut: string; d: FingerprintDisagreement }) {
  const [mine, theirs] = d.sides;
  return (
    <View
      style={styles.box}
      accessibilityLabel={`Where ${mine.function} and ${theirs.function} part ways`}
      testID={`fingerprint-disagreement-${mine.function}-${theirs.function}`}
    >
      <SkText variant="caption" tone="ink">
        Near z = {formatComplexText(d.at).replace(/ \+ 0i$/, ' ± 0i')} on {cut}, {mine.function} and {theirs.function}{' '}
        follow different conventions (each shown at the zero sign where its two conventions differ):
      </SkText>
      {d.sides.map((side) => (
        <View key={side.function} style={styles.side}>
          <Text style={styles.mono}>
            {side.function}({formatComplexText(side.at)}) gives {formatComplexText(side.value)}: {followsWords(side)}
          </Text>
          <Text style={styles.mono}>
            reference: signed zero {formatComplexText(side.reference['signed-zero'])}, counter-clockwise{' '}
            {formatComplexText(side.reference['counter-clockwise'])}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(1), borderTopWidth: 1, borderTopColor: theme.color.rule, paddingVertical: theme.space(2) },
  side: { gap: 2 },
  mono: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
});
