import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg from 'react-native-svg';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';

/** A legend entry whose swatch (the SVG children) is drawn with the same shape as in the picture, so the legend never relies on colour alone. */
export function LegendEntry({ text, children }: { text: string; children: ReactNode }) {
  return (
    <View style={styles.item}>
      <Svg width={18} height={16}>
        {children}
      </Svg>
      <SkText variant="caption">{text}</SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  item: { flexDirection: 'row', alignItems: 'center', gap: theme.space(1) },
});
