import { useState } from 'react';
import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { PropertyOutcome } from '../../shared/property-outcome';
import type { RunPropertyRow } from '../../shared/run-property-row';
import { DisclosureMark } from '../ui/disclosure-mark';
import { SkText } from '../ui/sk-text';
import { OUTCOME_TONE } from './outcome-tone';
import { propertyFailureParts } from '../../shared/property-failure-parts';
import { plural } from '../../shared/plural';

const KIND = {
  held: { glyph: '✓', word: 'held', tone: 'pass' },
  failed: { glyph: '❌', word: 'failed', tone: 'fail' },
  'not-checked': { glyph: '−', word: 'not checked', tone: 'neutral' },
} as const satisfies Record<PropertyOutcome['kind'], { glyph: string; word: string; tone: keyof typeof OUTCOME_TONE }>;

/**
 * The property checks of a run, grouped by suite × target: the law, its title, the pinned seed,
 * and for a failure the shrunk counterexample, the library's values with the law's two sides marked
 * and fast-check's replay path (shared/property-failure-parts.ts, as in the CLI's outputs).
 * Pairs with a failure or an unchecked law come first and open; a pair whose every law held is
 * one folded line (a 50-pair run would otherwise list every held law in full). On a phone every
 * pair starts folded to one line of counts, failures first: a failure's counterexample, values
 * and replay path are a screenful each, and the demo's largest run listed them all.
 */
export function PropertyChecks({ rows }: { rows: RunPropertyRow[] }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const [opened, setOpened] = useState<ReadonlySet<string>>(new Set());
  const groups = new Map<string, RunPropertyRow[]>();
  for (const row of rows) {
    const key = `${row.suite} × ${row.target}`;
    groups.set(key, [...(groups.get(key) ?? []), row]);
  }
  const rank = (checks: RunPropertyRow[]) =>
    checks.some((r) => r.outcome.kind === 'failed') ? 0 : checks.some((r) => r.outcome.kind === 'not-checked') ? 1 : 2;
  const ordered = [...groups.entries()].sort(([a, ra], [b, rb]) => rank(ra) - rank(rb) || a.localeCompare(b));
  const count = (kind: PropertyOutcome['kind']) => rows.filter((r) => r.outcome.kind === kind).length;
  const toggle = (pair: string) =>
    setOpened((now) => {
      const next = new Set(now);
      if (next.has(pair)) next.delete(pair);
      else next.add(pair);
      return next;
    });

  return (
    <View style={styles.list}>
      <SkText variant="label" testID="property-summary">
        {plural(rows.length, 'check')} over {plural(groups.size, 'pair')}: {count('failed')} failed,{' '}
        {count('not-checked')} not checked, {count('held')} held.
      </SkText>
      {ordered.map(([pair, checks]) => {
        const allHeld = rank(checks) === 2;
        const foldable = allHeld || !wide;
        const open = !foldable || opened.has(pair);
        const of = (kind: PropertyOutcome['kind']) => checks.filter((r) => r.outcome.kind === kind).length;
        const counts = (['failed', 'not-checked', 'held'] as const)
          .filter((kind) => of(kind) > 0)
          .map((kind) => ({ kind, text: `${KIND[kind].glyph} ${of(kind)} ${KIND[kind].word}` }));
        return (
          <View key={pair} style={styles.group} testID={`property-pair-${pair}`}>
            {foldable ? (
              <Pressable
                accessibilityRole="button"
                accessibilityLabel={
                  // The pair and the words the row shows, in order, then what pressing does (WCAG 2.5.3).
                  allHeld
                    ? `${pair}: all ${plural(checks.length, 'law')} held; ${open ? 'hide' : 'show'} them`
                    : `${pair}: ${counts.map((c) => c.text).join(' · ')}; ${open ? 'hide' : 'show'} the ${plural(checks.length, 'law')} checked`
                }
                aria-expanded={open}
                onPress={() => toggle(pair)}
                style={styles.foldRow}
              >
                <SkText variant="mono">{pair}</SkText>
                {allHeld ? (
                  <Text style={[styles.kind, { color: OUTCOME_TONE.pass.ink }]}>
                    {KIND.held.glyph} all {plural(checks.length, 'law')} held
                  </Text>
                ) : (
                  <Text style={styles.kind}>
                    {counts.map((c, i) => (
                      <Text key={c.kind} style={{ color: OUTCOME_TONE[KIND[c.kind].tone].ink }}>
                        {i > 0 ? ' · ' : ''}
                        {c.text}
                      </Text>
                    ))}
                  </Text>
                )}
                <DisclosureMark open={open} ink={allHeld ? OUTCOME_TONE.pass.ink : undefined} />
              </Pressable>
            ) : (
              <SkText variant="mono">{pair}</SkText>
            )}
            {open
              ? checks.map(({ outcome }) => <PropertyCheckCard key={outcome.law} pair={pair} outcome={outcome} />)
              : null}
          </View>
        );
      })}
    </View>
  );
}

function PropertyCheckCard({ pair, outcome }: { pair: string; outcome: PropertyOutcome }) {
  const kind = KIND[outcome.kind];
  const tone = OUTCOME_TONE[kind.tone];
  return (
    <View style={[styles.check, { borderLeftColor: tone.edge }]} testID={`property-${pair}-${outcome.law}`}>
      <View style={styles.checkHead}>
        <Text style={[styles.kind, { color: tone.ink }]}>
          {kind.glyph} {kind.word}
        </Text>
        <SkText variant="mono">{outcome.law}</SkText>
        <SkText variant="mono" tone="inkFaint">
          seed {outcome.seed}
        </SkText>
      </View>
      <SkText variant="body">{outcome.title}</SkText>
      {outcome.kind === 'held' ? (
        <SkText variant="caption" style={styles.detail}>
          {outcome.runs.toLocaleString('en-GB')} points drawn
          {outcome.excluded ? `, ${outcome.excluded} where the law makes no claim` : ''}. {outcome.statement}
        </SkText>
      ) : null}
      {outcome.kind === 'not-checked' ? (
        <SkText variant="caption" style={styles.detail}>
          {outcome.reason}
        </SkText>
      ) : null}
      {outcome.kind === 'failed' ? <PropertyFailure outcome={outcome} /> : null}
    </View>
  );
}

/** A failed law: why, the shrunk counterexample, each library value with the law's sides marked, and the replay. */
function PropertyFailure({ outcome }: { outcome: Extract<PropertyOutcome, { kind: 'failed' }> }) {
  const parts = propertyFailureParts(outcome);
  return (
    <View style={styles.failure}>
      <SkText variant="caption" style={styles.detail}>
        {outcome.reason}
      </SkText>
      <SkText variant="mono" selectable style={styles.label}>
        {parts.counterexample}
      </SkText>
      {parts.values.map((v) => (
        <View key={v.name} style={styles.valueRow}>
          <SkText variant="smallLabel" tone="inkFaint" style={styles.side}>
            {v.side ?? ''}
          </SkText>
          <SkText variant="mono" selectable>
            {v.name} = {v.text}
          </SkText>
        </View>
      ))}
      <SkText variant="mono" selectable style={styles.label}>
        {parts.replay}
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(4) },
  foldRow: {
    minHeight: 44,
    flexDirection: 'row',
    flexWrap: 'wrap',
    alignItems: 'center',
    justifyContent: 'space-between',
    columnGap: theme.space(3),
    paddingHorizontal: theme.space(3),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.rule,
    backgroundColor: theme.color.panel,
  },
  group: { gap: theme.space(2) },
  check: {
    backgroundColor: theme.color.panel,
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderLeftWidth: 4,
    borderRadius: theme.radius,
    padding: theme.space(3),
    gap: theme.space(1),
  },
  checkHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: theme.space(3) },
  kind: { fontFamily: theme.font.medium, fontSize: theme.size.small },
  detail: { lineHeight: 20 },
  failure: { gap: 2, marginTop: theme.space(1) },
  label: { marginTop: theme.space(1) },
  valueRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: theme.space(2) },
  side: { minWidth: 72 },
});
