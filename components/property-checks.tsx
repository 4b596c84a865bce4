import { StyleSheet, Text, View } from 'react-native';
import { theme } from '../constants/theme';
import type { PropertyOutcome } from '../shared/property-outcome';
import type { RunPropertyRow } from '../shared/run-property-row';
import { OUTCOME_TONE } from './outcome-tone';

const KIND = {
  held: { glyph: '✓', word: 'held', tone: 'pass' },
  failed: { glyph: '❌', word: 'failed', tone: 'fail' },
  'not-checked': { glyph: '−', word: 'not checked', tone: 'neutral' },
} as const satisfies Record<PropertyOutcome['kind'], { glyph: string; word: string; tone: keyof typeof OUTCOME_TONE }>;

const complex = (c: { re: string; im: string }) => `${c.re} ${c.im.startsWith('-') ? '−' : '+'} ${c.im.replace(/^-/, '')}i`;

/**
 * The property checks of a run, grouped by suite × target: the law, its title, the pinned seed,
 * and for a failure the shrunk counterexample, the library's values and fast-check's replay path.
 */
export function PropertyChecks({ rows }: { rows: RunPropertyRow[] }) {
  const groups = new Map<string, RunPropertyRow[]>();
  for (const row of rows) {
    const key = `${row.suite} × ${row.target}`;
    groups.set(key, [...(groups.get(key) ?? []), row]);
  }
  const failedFirst = [...groups.entries()].sort(
    ([a, ra], [b, rb]) => Number(rb.some((r) => r.outcome.kind === 'failed')) - Number(ra.some((r) => r.outcome.kind === 'failed')) || a.localeCompare(b),
  );
  return (
    <View style={styles.list}>
      {failedFirst.map(([pair, checks]) => (
        <View key={pair} style={styles.group}>
          <Text style={styles.pair}>{pair}</Text>
          {checks.map(({ outcome }) => {
            const kind = KIND[outcome.kind];
            const tone = OUTCOME_TONE[kind.tone];
            return (
              <View key={outcome.law} style={[styles.check, { borderLeftColor: tone.edge }]} testID={`property-${pair}-${outcome.law}`}>
                <View style={styles.checkHead}>
                  <Text style={[styles.kind, { color: tone.ink }]}>
                    {kind.glyph} {kind.word}
                  </Text>
                  <Text style={styles.law}>{outcome.law}</Text>
                  <Text style={styles.seed}>seed {outcome.seed}</Text>
                </View>
                <Text style={styles.title}>{outcome.title}</Text>
                {outcome.kind === 'held' ? (
                  <Text style={styles.detail}>
                    {outcome.runs.toLocaleString('en-GB')} points drawn{outcome.excluded ? `, ${outcome.excluded} where the law makes no claim` : ''}. {outcome.statement}
                  </Text>
                ) : null}
                {outcome.kind === 'not-checked' ? <Text style={styles.detail}>{outcome.reason}</Text> : null}
                {outcome.kind === 'failed' ? (
                  <View style={styles.failure}>
                    <Text style={styles.detail}>{outcome.reason}</Text>
                    <Text style={styles.label}>Counterexample (after {outcome.shrinks} shrinks, {outcome.runs} runs)</Text>
                    {outcome.counterexample.map((z, i) => (
                      <Text key={i} style={styles.mono} selectable>
                        {outcome.counterexample.length > 1 ? `z${i + 1}` : 'z'} = {complex(z)}
                      </Text>
                    ))}
                    {outcome.values.map((v) => (
                      <Text key={v.name} style={styles.mono} selectable>
                        {v.name} = {complex(v.value)}
                      </Text>
                    ))}
                    <Text style={styles.label}>Replay with fast-check: seed {outcome.seed}, path</Text>
                    <Text style={styles.mono} selectable>
                      {outcome.path}
                    </Text>
                  </View>
                ) : null}
              </View>
            );
          })}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(4) },
  group: { gap: theme.space(2) },
  pair: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.ink },
  check: { backgroundColor: theme.color.panel, borderWidth: 1, borderColor: theme.color.rule, borderLeftWidth: 4, borderRadius: theme.radius, padding: theme.space(3), gap: theme.space(1) },
  checkHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: theme.space(3) },
  kind: { fontFamily: theme.font.medium, fontSize: theme.size.small },
  law: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.ink },
  seed: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.inkFaint },
  title: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.ink },
  detail: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft, lineHeight: 20 },
  failure: { gap: 2, marginTop: theme.space(1) },
  label: { fontFamily: theme.font.medium, fontSize: theme.size.small, color: theme.color.inkFaint, marginTop: theme.space(1) },
  mono: { fontFamily: theme.font.mono, fontSize: theme.size.small, color: theme.color.ink },
});
