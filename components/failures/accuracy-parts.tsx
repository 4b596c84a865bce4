import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { Diagnosis } from '../../shared/diagnosis';
import { formatUlps } from '../../shared/format-ulps';
import { SkText } from '../ui/sk-text';

type Inaccurate = Extract<Diagnosis, { kind: 'inaccurate' }>;

const PART = { re: 'real', im: 'imaginary' } as const;
const num = (x: number) => x.toPrecision(2);

/**
 * How far an inaccurate value is, per part and as a whole: ulps and absolute error of each part,
 * the normwise relative error |library − reference| / |reference|, and for a part lost to
 * cancellation its absolute error beside |value| instead of its ulps (a part that should be 0 and
 * is 1e-15 reads 4.4e18 ulps, which says nothing about the value).
 */
export function AccuracyParts({ label: d }: { label: Inaccurate }) {
  const c = d.cancellation;
  return (
    <View style={styles.root} testID="accuracy-parts">
      {d.parts ? (
        <View role="table" aria-label="Error per part">
          <View style={[styles.row, styles.head]} role="row">
            {['Part', 'Ulps', 'Absolute error'].map((h) => (
              <Text key={h} style={[styles.cell, styles.headText]} role="columnheader">
                {h}
              </Text>
            ))}
          </View>
          {(['re', 'im'] as const).map((p) => (
            <View key={p} style={styles.row} role="row">
              <Text role="cell" style={styles.cell}>
                {PART[p]}
              </Text>
              <Text role="cell" style={[styles.cell, styles.mono]}>
                {c?.part === p ? 'lost to cancellation' : formatUlps(d.parts![p].ulps)}
              </Text>
              <Text role="cell" style={[styles.cell, styles.mono]}>
                {num(d.parts![p].absolute)}
              </Text>
            </View>
          ))}
        </View>
      ) : null}
      <SkText variant="body">
        Normwise relative error of the whole value: <Text style={styles.mono}>{num(d.relativeError)}</Text>
        {d.parts ? null : ` (${formatUlps(d.ulps)} ulps in the worse part)`}.
      </SkText>
      {c ? (
        <SkText variant="body" testID="cancellation">
          The {PART[c.part]} part is lost to cancellation: it is {num(c.absoluteError)} off, beside a value of size
          |value| = {num(c.magnitude)}. Its ulps are not shown, since a part this small beside the whole value can be
          thousands of ulps off while the value is off by less than a rounding of its size.
        </SkText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(2) },
  row: { flexDirection: 'row', borderBottomWidth: 1, borderBottomColor: theme.color.rule, paddingVertical: 4 },
  head: { borderBottomColor: theme.color.inkFaint },
  cell: { flex: 1, fontFamily: theme.font.regular, fontSize: 14, color: theme.color.ink },
  headText: { fontFamily: theme.font.medium, color: theme.color.inkSoft },
  mono: { fontFamily: theme.font.mono, fontSize: 14 },
});
