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
import { groupPropertyChecks, type PropertyGroup } from './group-property-checks';

const KIND = {
  held: { glyph: '✓', word: 'held', tone: 'pass' },
  failed: { glyph: '❌', word: 'failed', tone: 'fail' },
  'not-checked': { glyph: '−', word: 'not checked', tone: 'neutral' },
} as const satisfies Record<PropertyOutcome['kind'], { glyph: string; word: string; tone: keyof typeof OUTCOME_TONE }>;

/**
 * The property checks of a run, grouped by suite × target: the law, its title, the pinned seed,
 * and for a failure the shrunk counterexample, the library's values with the law's two sides marked
 * and fast-check's replay path (shared/property-failure-parts.ts, as in the CLI's outputs).
 * Targets of a suite whose outcomes are identical share one group (group-property-checks.ts).
 * Groups with a failure or an unchecked law come first and open; a group whose every law held is
 * one folded line (a 50-pair run would otherwise list every held law in full), and on a wide
 * screen those lines share a row. On a phone every group starts folded to one line of counts,
 * failures first: a failure's counterexample, values and replay path are a screenful each, and
 * the demo's largest run listed them all. On a wide screen a law's card puts what was found
 * beside the law's statement rather than under it (tests/e2e/day-run-page.test.ts measures it).
 */
export function PropertyChecks({ rows }: { rows: RunPropertyRow[] }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const [opened, setOpened] = useState<ReadonlySet<string>>(new Set());
  const groups = groupPropertyChecks(rows);
  const pairs = new Set(rows.map((r) => `${r.suite}\u0000${r.target}`)).size;
  const count = (kind: PropertyOutcome['kind']) => rows.filter((r) => r.outcome.kind === kind).length;
  const toggle = (pair: string) =>
    setOpened((now) => {
      const next = new Set(now);
      if (next.has(pair)) next.delete(pair);
      else next.add(pair);
      return next;
    });

  const groupView = ({ pair, targets, checks, rank }: PropertyGroup) => {
    const allHeld = rank === 2;
    const foldable = allHeld || !wide;
    const open = !foldable || opened.has(pair);
    const of = (kind: PropertyOutcome['kind']) => checks.filter((r) => r.kind === kind).length;
    // Merged targets: the counts are each one's, and the row says so.
    const each = targets.length > 1 ? (targets.length === 2 ? ' on both' : ` on all ${targets.length}`) : '';
    const counts = (['failed', 'not-checked', 'held'] as const)
      .filter((kind) => of(kind) > 0)
      .map((kind) => ({ kind, text: `${KIND[kind].glyph} ${of(kind)} ${KIND[kind].word}` }));
    return (
      <View key={pair} style={[styles.group, wide && allHeld && styles.heldGroup]} testID={`property-pair-${pair}`}>
        {foldable ? (
          <Pressable
            accessibilityRole="button"
            accessibilityLabel={
              // The pair and the words the row shows, in order, then what pressing does (WCAG 2.5.3).
              allHeld
                ? `${pair}: all ${plural(checks.length, 'law')} held${each}; ${open ? 'hide' : 'show'} them`
                : `${pair}: ${counts.map((c) => c.text).join(' · ')}${each}; ${open ? 'hide' : 'show'} the ${plural(checks.length, 'law')} checked`
            }
            aria-expanded={open}
            onPress={() => toggle(pair)}
            style={styles.foldRow}
          >
            <SkText variant="mono">{pair}</SkText>
            {allHeld ? (
              <Text style={[styles.kind, { color: OUTCOME_TONE.pass.ink }]}>
                {KIND.held.glyph} all {plural(checks.length, 'law')} held{each}
              </Text>
            ) : (
              <Text style={styles.kind}>
                {counts.map((c, i) => (
                  <Text key={c.kind} style={{ color: OUTCOME_TONE[KIND[c.kind].tone].ink }}>
                    {i > 0 ? ' · ' : ''}
                    {c.text}
                  </Text>
                ))}
                {each}
              </Text>
            )}
            <DisclosureMark open={open} ink={allHeld ? OUTCOME_TONE.pass.ink : undefined} />
          </Pressable>
        ) : (
          <SkText variant="mono">
            {pair}
            {each ? ` (the same${each})` : ''}
          </SkText>
        )}
        {open
          ? checks.map((outcome) => <PropertyCheckCard key={outcome.law} pair={pair} outcome={outcome} wide={wide} />)
          : null}
      </View>
    );
  };
  const held = groups.filter((g) => g.rank === 2);

  return (
    <View style={styles.list}>
      <SkText variant="label" testID="property-summary">
        {plural(rows.length, 'check')} over {plural(pairs, 'pair')}: {count('failed')} failed, {count('not-checked')}{' '}
        not checked, {count('held')} held.
      </SkText>
      {groups.filter((g) => g.rank < 2).map(groupView)}
      {wide && held.length > 0 ? <View style={styles.heldRow}>{held.map(groupView)}</View> : held.map(groupView)}
    </View>
  );
}

function PropertyCheckCard({ pair, outcome, wide }: { pair: string; outcome: PropertyOutcome; wide: boolean }) {
  const kind = KIND[outcome.kind];
  const tone = OUTCOME_TONE[kind.tone];
  const brief = wide && outcome.kind !== 'failed';
  const statement = (
    <View style={wide ? styles.column : styles.stack}>
      <View style={styles.checkHead}>
        <Text style={[styles.kind, { color: tone.ink }]}>
          {kind.glyph} {kind.word}
        </Text>
        <SkText variant="mono">{outcome.law}</SkText>
        <SkText variant="mono" tone="inkFaint">
          seed {outcome.seed}
        </SkText>
      </View>
      {/* A law that held or was not checked is one line of its statement on a wide screen (the
          whole sentence stays in the page for a screen reader and a copy), and a held law one line
          of its evidence beside it: a failure's card is the one to read in full. */}
      <SkText
        variant={wide ? 'caption' : 'body'}
        style={wide ? styles.detail : null}
        numberOfLines={brief ? 1 : undefined}
      >
        {outcome.title}
      </SkText>
    </View>
  );
  const found =
    outcome.kind === 'held' ? (
      <SkText variant="caption" style={styles.detail} numberOfLines={brief ? 1 : undefined}>
        {outcome.runs.toLocaleString('en-GB')} points drawn
        {outcome.excluded ? `, ${outcome.excluded} where the law makes no claim` : ''}. {outcome.statement}
      </SkText>
    ) : outcome.kind === 'not-checked' ? (
      <SkText variant="caption" style={styles.detail}>
        {outcome.reason}
      </SkText>
    ) : (
      <PropertyFailure outcome={outcome} />
    );
  // A wide card puts what was found beside the law's statement: one above the other, a failing
  // law's card was ~230 px tall at 1440 px, most of its width empty beside the counterexample.
  // Measured on the demo's largest run: 172 px side by side in halves, 200 px with the statement
  // given 3/5 (the values and replay path wrap more than the statement gains).
  return (
    <View
      style={[styles.check, wide && styles.checkWide, brief && styles.checkBrief, { borderLeftColor: tone.edge }]}
      testID={`property-${pair}-${outcome.law}`}
    >
      {statement}
      <View style={wide ? styles.column : styles.stack}>{found}</View>
    </View>
  );
}

/** A failed law: why, the shrunk counterexample, each library value with the law's sides marked, and the replay. */
function PropertyFailure({ outcome }: { outcome: Extract<PropertyOutcome, { kind: 'failed' }> }) {
  const parts = propertyFailureParts(outcome);
  return (
    <View style={styles.failure}>
      <SkText variant="caption" style={styles.reason}>
        {outcome.reason}
      </SkText>
      <SkText variant="mono" selectable>
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
      <SkText variant="mono" selectable>
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
  checkWide: { flexDirection: 'row', columnGap: theme.space(4) },
  column: { flex: 1, flexBasis: 0, gap: theme.space(1) },
  checkBrief: { paddingVertical: theme.space(2) },
  stack: { gap: theme.space(1) },
  heldRow: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  heldGroup: { flexBasis: 420, flexGrow: 1 },
  reason: { lineHeight: 20, fontFamily: theme.font.medium },
  checkHead: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: theme.space(3) },
  kind: { fontFamily: theme.font.medium, fontSize: theme.size.small },
  detail: { lineHeight: 20 },
  failure: { gap: theme.space(1) },
  valueRow: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', columnGap: theme.space(2) },
  side: { minWidth: 72 },
});
