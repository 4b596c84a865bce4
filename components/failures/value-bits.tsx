import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatHexDouble } from '../../harness/web';
import { theme } from '../../constants/theme';
import type { FailureView } from '../../shared/failure-view';
import type { WireComplex } from '../../shared/wire-complex';
import { wireDouble } from '../../shared/wire-double';
import { DisclosureToggle } from '../ui/disclosure-toggle';
import { SkText } from '../ui/sk-text';
import { ValueRow } from './value-row';

const hexOf = (c: WireComplex): WireComplex => ({
  re: formatHexDouble(wireDouble(c.re)),
  im: formatHexDouble(wireDouble(c.im)),
});

/**
 * The case's numbers: z, the expected and the library's value, and both one-sided limits when
 * the point lies on a cut, in decimal; the exact bits (C99 hex floats) on demand, since two
 * decimals can hide a last-bit or zero-sign difference.
 */
export function ValueBits({ failure: f }: { failure: FailureView }) {
  const [bits, setBits] = useState(false);
  const rows: { name: string; value: WireComplex | null; hex?: WireComplex }[] = [
    { name: 'z (input)', value: f.z, hex: f.zHex },
    { name: 'expected', value: f.expected },
    { name: 'library', value: f.actual },
    ...(f.limits
      ? f.limits.sides.map((side, i) => ({ name: `limit ${side}`, value: f.limits!.values[i] ?? null }))
      : []),
  ];
  return (
    <View style={styles.root}>
      {rows.map((r) => (
        <ValueRow key={r.name} name={r.name} value={r.value}>
          {bits && r.value ? <HexLine hex={r.hex ?? hexOf(r.value)} /> : null}
        </ValueRow>
      ))}
      {f.limits ? null : <SkText variant="caption">Not on a cut: there is one limit, the value itself.</SkText>}
      <DisclosureToggle
        open={bits}
        onToggle={() => setBits(!bits)}
        accessibilityLabel={bits ? 'Hide exact bits' : 'Show exact bits'}
        style={styles.toggle}
      >
        <SkText variant="smallLabel" tone="ink">
          {bits ? 'Hide exact bits' : 'Show exact bits (C hex floats)'}
        </SkText>
      </DisclosureToggle>
    </View>
  );
}

function HexLine({ hex }: { hex: WireComplex }) {
  return (
    <SkText variant="mono" tone="inkSoft" style={styles.hex} selectable>
      re {hex.re}
      {'\n'}im {hex.im}
    </SkText>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(3) },
  hex: { backgroundColor: theme.color.paper, padding: theme.space(2), borderRadius: 4 },
  toggle: { alignSelf: 'flex-start' },
});
