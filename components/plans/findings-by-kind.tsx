import { Link } from 'expo-router';
import { useRef, useState } from 'react';
import { Pressable, ScrollView, StyleSheet, useWindowDimensions, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { useFindingsByKind } from '../../client/use-findings-by-kind';
import { theme } from '../../constants/theme';
import type { DiagnosisKind } from '../../shared/diagnosis';
import { diagnosisClass } from '../../shared/diagnosis-class';
import { DIAGNOSIS_CLASSES } from '../../shared/diagnosis-classes';
import { DIAGNOSIS_KIND_NAMES } from '../../shared/diagnosis-kind-names';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';
import { failuresPath } from '../../shared/failures-path';
import type { FindingsByKindView } from '../../shared/findings-by-kind-view';
import { DIAGNOSIS_STYLES } from '../failures/diagnosis-styles';
import { STOPPED_BY_ERROR } from '../../shared/stopped-by-error';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { TitledPanel } from '../ui/titled-panel';
import { plural } from '../../shared/plural';

type RunCounts = FindingsByKindView['runs'][number];

/** How many completed runs the picture shows: twelve columns fit 1440 px beside the kind names. */
const RUNS = 12;
/**
 * A column shares the width the panel leaves beside the kind names, between a touch target
 * (theme.touch) and WIDEST; where twelve do not fit (a phone) they scroll, newest in view.
 */
const COLUMN = theme.touch;
const WIDEST = 112;
/** The tallest bar, in px: a row's largest count. */
const BAR = 40;
const CLASS_TITLE = { branch: 'Branch findings', accuracy: 'Accuracy findings' } as const;

const day = (iso: string) => new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short' }).format(new Date(iso));
const time = (iso: string) =>
  new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23' }).format(new Date(iso));

/**
 * A plan's findings by diagnosis kind across its latest completed runs: one row per kind that
 * occurs (branch kinds first, under their class, then accuracy), one column per run, oldest on
 * the left. Each row is drawn to its own scale with its count written under each bar, so the
 * numbers read without the bars or their ink; a bar is a link to that run's failures of that
 * kind, a column's date a link to the run.
 */
export function FindingsByKind({ planId }: { planId: string }) {
  const wide = useWindowDimensions().width >= theme.wide;
  const query = useFindingsByKind(planId, RUNS);
  const scroller = useRef<ScrollView>(null);
  const [room, setRoom] = useState(0);
  const runs = query.data?.runs ?? [];
  const occurring = DIAGNOSIS_KINDS.filter((k) => runs.some((r) => r.byKind[k] > 0));
  const absent = DIAGNOSIS_KINDS.filter((k) => !occurring.includes(k));
  const stopped = runs.filter((r) => r.checksStopped > 0);
  const column = Math.max(COLUMN, Math.min(WIDEST, Math.floor(room / Math.max(1, runs.length))));
  const lead =
    runs.length === 0
      ? undefined
      : `The latest ${plural(runs.length, 'completed run')}, oldest on the left. A failing point counts under each of its labels; each row has its own scale and the number under a bar is its count. Tap a bar for that run's failures of that kind.`;

  return (
    <TitledPanel title="Findings by kind" lead={lead} testID="findings-by-kind">
      {query.isPending ? <QueryState state="loading" /> : null}
      {query.isError ? (
        <QueryState state="error" message={query.error.message} onRetry={() => void query.refetch()} />
      ) : null}
      {query.data && runs.length === 0 ? (
        <SkText variant="caption">No completed run of this plan yet: each completed run adds a column here.</SkText>
      ) : null}
      {runs.length > 0 && occurring.length === 0 ? (
        <SkText variant="caption">
          No findings in {runs.length === 1 ? 'its completed run' : `these ${runs.length} completed runs`}.
        </SkText>
      ) : null}
      {runs.length > 0 && occurring.length > 0 ? (
        <View style={styles.grid}>
          <View style={[styles.names, { width: wide ? 200 : 128 }]}>
            <View style={styles.headCell} />
            {DIAGNOSIS_CLASSES.map((cls) => {
              const kinds = occurring.filter((k) => diagnosisClass(k) === cls);
              if (kinds.length === 0) return null;
              return (
                <View key={cls}>
                  <View style={styles.classCell}>
                    <SkText variant="smallLabel" accessibilityRole="header" aria-level={3}>
                      {CLASS_TITLE[cls]}
                    </SkText>
                  </View>
                  {kinds.map((k) => (
                    <KindName key={k} kind={k} runs={runs} />
                  ))}
                </View>
              );
            })}
          </View>
          <ScrollView
            horizontal
            ref={scroller}
            style={styles.columns}
            onLayout={(e) => setRoom(e.nativeEvent.layout.width)}
            onContentSizeChange={() => scroller.current?.scrollToEnd({ animated: false })}
          >
            {runs.map((run) => (
              <View key={run.id} style={{ width: column }}>
                <Link href={`/runs/${run.id}`} asChild>
                  <Pressable
                    accessibilityRole="link"
                    accessibilityLabel={`Run of ${day(run.createdAt)} ${time(run.createdAt)}: ${plural(run.failed, 'failing point')}${run.checksStopped > 0 ? `, ${stoppedWords(run)}` : ''}`}
                    style={styles.headCell}
                  >
                    {/* One text of two lines, so what shows is within the link's name (WCAG 2.5.3). */}
                    <SkText variant="smallLabel" tone="accent" style={styles.centre}>
                      {`${day(run.createdAt)}\n${time(run.createdAt)}`}
                    </SkText>
                  </Pressable>
                </Link>
                {DIAGNOSIS_CLASSES.map((cls) => {
                  const kinds = occurring.filter((k) => diagnosisClass(k) === cls);
                  if (kinds.length === 0) return null;
                  return (
                    <View key={cls}>
                      <View style={styles.classCell} />
                      {kinds.map((k) => (
                        <KindBar key={k} kind={k} run={run} max={Math.max(...runs.map((r) => r.byKind[k]))} />
                      ))}
                    </View>
                  );
                })}
              </View>
            ))}
          </ScrollView>
        </View>
      ) : null}
      {stopped.length > 0 ? (
        <SkText variant="caption" testID="findings-by-kind-stopped">
          Not counted here, as they checked nothing:{' '}
          {stopped.map((r) => `${stoppedWords(r)} in the run of ${day(r.createdAt)} ${time(r.createdAt)}`).join('; ')}.
        </SkText>
      ) : null}
      {runs.length > 0 && occurring.length > 0 && absent.length > 0 ? (
        <SkText variant="caption">
          None in these runs: {absent.map((k) => DIAGNOSIS_KIND_NAMES[k].name).join(', ')}.
        </SkText>
      ) : null}
    </TitledPanel>
  );
}

/** A run's checks stopped by an error in the words of every run verdict: "2 checks stopped by an error". */
const stoppedWords = (run: RunCounts) => `${plural(run.checksStopped, 'check')} ${STOPPED_BY_ERROR}`;

/** A row's name: the kind's glyph and word, and its counts in words for a screen reader. */
function KindName({ kind, runs }: { kind: DiagnosisKind; runs: RunCounts[] }) {
  const style = DIAGNOSIS_STYLES[kind];
  return (
    <View
      style={styles.rowCell}
      accessible
      accessibilityRole="image"
      accessibilityLabel={`${style.word}, oldest run first: ${runs.map((r) => r.byKind[kind]).join(', ')}`}
    >
      <SkText variant="label" numberOfLines={2} style={{ color: theme.kindInk[kind] }}>
        {style.glyph} {style.word}
      </SkText>
    </View>
  );
}

/** One run's count of one kind: a bar to the row's scale with its number under it, a link to those failures. */
function KindBar({ kind, run, max }: { kind: DiagnosisKind; run: RunCounts; max: number }) {
  const n = run.byKind[kind];
  const name = DIAGNOSIS_KIND_NAMES[kind].name;
  const bar = n > 0 ? Math.max(3, Math.round((n / max) * BAR)) : 0;
  const body = (
    <>
      <View style={styles.barSpace}>
        {bar > 0 ? <View style={[styles.bar, { height: bar, backgroundColor: theme.kindInk[kind] }]} /> : null}
      </View>
      <SkText variant={n > 0 ? 'smallLabel' : 'caption'} tone={n > 0 ? 'ink' : 'inkSoft'} style={styles.centre}>
        {n}
      </SkText>
    </>
  );
  if (n === 0)
    return (
      <View
        style={styles.rowCell}
        accessible
        accessibilityRole="image"
        accessibilityLabel={`No ${name} in the run of ${formatDate(run.createdAt)}`}
      >
        {body}
      </View>
    );
  return (
    <Link href={failuresPath({ run: run.id, diagnosis: kind })} asChild>
      <Pressable
        accessibilityRole="link"
        accessibilityLabel={`${n} ${name} in the run of ${formatDate(run.createdAt)}: open these failures`}
        style={styles.rowCell}
      >
        {body}
      </Pressable>
    </Link>
  );
}

const ROW = BAR + 28;
const styles = StyleSheet.create({
  grid: { flexDirection: 'row' },
  names: { flexShrink: 0 },
  columns: { flexGrow: 1 },
  headCell: { height: 44, justifyContent: 'center', alignItems: 'center' },
  classCell: {
    height: 28,
    justifyContent: 'flex-end',
    paddingBottom: 2,
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
  },
  rowCell: { height: ROW, justifyContent: 'center', alignItems: 'stretch' },
  barSpace: { height: BAR, justifyContent: 'flex-end', alignItems: 'center' },
  bar: { width: 20, borderTopLeftRadius: 2, borderTopRightRadius: 2 },
  centre: { textAlign: 'center' },
});
