import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import { formatComplexText } from '../../shared/format-complex-text';
import type { WireComplex } from '../../shared/wire-complex';

/**
 * One named value of a case, in decimal, with whatever goes under it (its exact bits). `code`:
 * the name is an expression (`pow(z, 0.5)`), shown as written rather than as a small-caps heading.
 */
export function ValueRow({
  name,
  value,
  code = false,
  children,
}: {
  name: string;
  value: WireComplex | null;
  code?: boolean;
  children?: ReactNode;
}) {
  return (
    <View style={styles.row}>
      <Text style={code ? styles.code : styles.name}>{name}</Text>
      <Text style={styles.value} selectable>
        {formatComplexText(value)}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: 2, borderBottomWidth: 1, borderBottomColor: theme.color.rule, paddingBottom: theme.space(2) },
  name: {
    fontFamily: theme.font.medium,
    fontSize: 12,
    color: theme.color.inkFaint,
    textTransform: 'uppercase',
    letterSpacing: 0.6,
  },
  code: { fontFamily: theme.font.mono, fontSize: 12, color: theme.color.inkSoft },
  value: { fontFamily: theme.font.mono, fontSize: 15, color: theme.color.ink },
});
