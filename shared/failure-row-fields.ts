import type { Diagnosis, DiagnosisKind } from './diagnosis';
import type { DiagnosisClass } from './diagnosis-class';
import { outcomeLabels } from './outcome-labels';
import { pointClass } from './point-class';
import type { PointFinding, StepValue } from './run-result';
import type { WireComplex } from './wire-complex';

/** Carries a field's TypeScript type in the list; it has no value at run time. */
const typed = <T>(): T => undefined as T;

/**
 * One cell of the CSV export: its header, how it reads the row (missing values are ''), and
 * whether it is a `number` the product writes itself (a double, or a wire number such as "-0",
 * "-1.5e-300", "-0x1p-1074", "-inf") or `text` someone could have typed (a path name, a target
 * name). The export neutralises text that a spreadsheet would run as a formula, and leaves a
 * number column's numbers as they are, since a quote would turn "-0" into text and lose it.
 */
type CsvCell<R> = readonly [header: string, read: (row: R) => string | number, kind: 'text' | 'number'];

const cell = <K extends string>(
  header: string,
  key: K,
  kind: 'text' | 'number' = 'text',
): CsvCell<Record<K, string | number>> => [header, (r) => r[key], kind];

const complexCells = <K extends string>(key: K, prefix: string): readonly CsvCell<Record<K, WireComplex | null>>[] => [
  [`${prefix}_re`, (r) => r[key]?.re ?? '', 'number'],
  [`${prefix}_im`, (r) => r[key]?.im ?? '', 'number'],
];

/**
 * Every column of the table `failures`, declared once. `key` is the JSON key (`FailureView`'s
 * and the composite type `failure_table_row`'s attribute name), `column` and `columnType` are
 * the table's (migration 1764730000000), `select` is the SQL that reads it when that is not the
 * column itself. `shown` says where the field goes: `row` in every page row (the composite type
 * lists exactly these, in this order, migration 1764800000000), `detail` only with one failure and
 * in the CSV, `stored` nowhere outside the server. `csv` lists the export's cells in export order;
 * `nonFiniteAsNull` marks numbers that may be ±inf or NaN, which JSON cannot write; `fromFinding`
 * reads the column from the harness's finding (the other columns come from the shard and the path).
 *
 * Derived from it: `FailureView`, the page SQL (`failure-search-sql.ts`: the columns and the
 * ROW(...)), the detail columns (`failure-search.ts`), the CSV export (`failures-router.ts`) and
 * the finding's columns in `storeResult` (`shard-executor.ts`).
 * `tests/server/migrations/failure-row-fields.test.ts` holds the migrations to this list.
 */
export const FAILURE_ROW_FIELDS = [
  {
    key: 'id',
    column: 'id',
    columnType: 'bigint',
    select: 'id::text',
    rowType: 'text',
    shown: 'row',
    value: typed<string>(),
  },
  {
    key: 'runId',
    column: 'run_id',
    columnType: 'uuid',
    shown: 'row',
    value: typed<string>(),
    csv: [cell('run', 'runId')],
  },
  { key: 'shardId', column: 'shard_id', columnType: 'uuid', shown: 'stored', value: typed<string>() },
  {
    key: 'suiteSlug',
    column: 'suite_slug',
    columnType: 'text',
    shown: 'row',
    value: typed<string>(),
    csv: [['suite', (r: { suiteSlug: string; suiteVersion: number }) => `${r.suiteSlug}@${r.suiteVersion}`, 'text']],
  },
  { key: 'suiteVersion', column: 'suite_version', columnType: 'integer', shown: 'row', value: typed<number>() },
  {
    key: 'targetName',
    column: 'target_name',
    columnType: 'text',
    shown: 'row',
    value: typed<string>(),
    csv: [cell('target', 'targetName')],
  },
  { key: 'targetLibrary', column: 'target_library', columnType: 'text', shown: 'stored', value: typed<string>() },
  { key: 'targetVersion', column: 'target_version', columnType: 'text', shown: 'stored', value: typed<string>() },
  {
    key: 'convention',
    column: 'convention',
    columnType: 'text',
    shown: 'row',
    value: typed<string>(),
    csv: [cell('convention', 'convention')],
  },
  {
    key: 'pathName',
    column: 'path_name',
    columnType: 'text',
    shown: 'row',
    value: typed<string>(),
    csv: [cell('path', 'pathName')],
  },
  {
    key: 'pointIndex',
    column: 'point_index',
    columnType: 'integer',
    shown: 'row',
    value: typed<number>(),
    fromFinding: (f: PointFinding) => f.index,
  },
  {
    key: 't',
    column: 't',
    columnType: 'double precision',
    shown: 'row',
    value: typed<number>(),
    fromFinding: (f: PointFinding) => f.t,
    csv: [cell('t', 't', 'number')],
  },
  {
    key: 'label',
    column: 'label',
    columnType: 'text',
    nullable: true,
    shown: 'row',
    value: typed<string | null>(),
    fromFinding: (f: PointFinding) => f.label ?? null,
  },
  {
    key: 'z',
    column: 'z',
    columnType: 'jsonb',
    shown: 'row',
    value: typed<WireComplex>(),
    fromFinding: (f: PointFinding) => f.z,
    csv: complexCells('z', 'z'),
  },
  {
    key: 'zHex',
    column: 'z_hex',
    columnType: 'jsonb',
    shown: 'row',
    value: typed<WireComplex>(),
    fromFinding: (f: PointFinding) => f.zHex,
    csv: complexCells('zHex', 'z_hex'),
  },
  /** The same point across runs and versions: suite, path and the input's exact bits. */
  { key: 'pointKey', column: 'point_key', columnType: 'text', shown: 'stored', value: typed<string>() },
  {
    key: 'expected',
    column: 'expected',
    columnType: 'jsonb',
    nullable: true,
    shown: 'row',
    value: typed<WireComplex | null>(),
    fromFinding: (f: PointFinding) => f.expected,
    csv: complexCells('expected', 'expected'),
  },
  {
    key: 'actual',
    column: 'actual',
    columnType: 'jsonb',
    nullable: true,
    shown: 'row',
    value: typed<WireComplex | null>(),
    fromFinding: (f: PointFinding) => f.actual,
    csv: complexCells('actual', 'actual'),
  },
  {
    key: 'outcomeKind',
    column: 'outcome_kind',
    columnType: 'text',
    shown: 'row',
    value: typed<'fail' | 'error' | 'skipped'>(),
    fromFinding: (f: PointFinding) => (f.outcome.kind === 'pass' ? 'fail' : f.outcome.kind),
    csv: [cell('outcome', 'outcomeKind')],
  },
  {
    key: 'diagnosisKind',
    column: 'diagnosis_kind',
    columnType: 'text',
    nullable: true,
    shown: 'stored',
    value: typed<DiagnosisKind | null>(),
    fromFinding: (f: PointFinding) => (f.outcome.kind === 'fail' ? f.outcome.diagnosis.kind : null),
  },
  {
    key: 'diagnosis',
    column: 'diagnosis',
    columnType: 'jsonb',
    nullable: true,
    shown: 'row',
    value: typed<Diagnosis | null>(),
    fromFinding: (f: PointFinding) => (f.outcome.kind === 'fail' ? f.outcome.diagnosis : null),
    csv: [['diagnosis', (r: { diagnosis: Diagnosis | null }) => r.diagnosis?.kind ?? '', 'text']],
  },
  {
    key: 'ulps',
    column: 'ulps',
    columnType: 'double precision',
    nullable: true,
    nonFiniteAsNull: true,
    shown: 'row',
    value: typed<number | null>(),
    fromFinding: (f: PointFinding) =>
      f.outcome.kind === 'fail' && Number.isFinite(f.outcome.ulps) ? f.outcome.ulps : null,
    csv: [['ulps', (r: { ulps: number | null }) => r.ulps ?? '', 'number']],
  },
  {
    key: 'relativeError',
    column: 'relative_error',
    columnType: 'double precision',
    nullable: true,
    nonFiniteAsNull: true,
    shown: 'row',
    value: typed<number | null>(),
    fromFinding: (f: PointFinding) =>
      f.outcome.kind === 'fail' && Number.isFinite(f.outcome.relativeError) ? f.outcome.relativeError : null,
    csv: [['relative_error', (r: { relativeError: number | null }) => r.relativeError ?? '', 'number']],
  },
  /** Set when the run completes: this point passed in the previous completed run of the plan. */
  {
    key: 'isRegression',
    column: 'is_regression',
    columnType: 'boolean',
    shown: 'row',
    value: typed<boolean>(),
    csv: [['regression', (r: { isRegression: boolean }) => (r.isRegression ? 'yes' : 'no'), 'text']],
  },
  /** Every label of the point, the leading one (`diagnosis`) first; one label for rows stored before there were several. */
  {
    key: 'labels',
    column: 'labels',
    columnType: 'jsonb',
    shown: 'row',
    value: typed<Diagnosis[]>(),
    fromFinding: (f: PointFinding) => outcomeLabels(f.outcome),
    csv: [['labels', (r: { labels: Diagnosis[] }) => r.labels.map((l) => l.kind).join(' + '), 'text']],
  },
  /** branch or accuracy (point-class.ts); null for an error or a skipped point. Pages list branch findings first. */
  {
    key: 'findingClass',
    column: 'finding_class',
    columnType: 'text',
    nullable: true,
    shown: 'row',
    value: typed<DiagnosisClass | null>(),
    fromFinding: (f: PointFinding) => pointClass(outcomeLabels(f.outcome)),
    csv: [['class', (r: { findingClass: DiagnosisClass | null }) => r.findingClass ?? '', 'text']],
  },
  /** The standard clause or rule that fixes the expected value here. */
  {
    key: 'rule',
    column: 'rule',
    columnType: 'text',
    shown: 'detail',
    value: typed<string>(),
    fromFinding: (f: PointFinding) => f.rule,
    csv: [['rule', (r: { rule?: string }) => r.rule ?? '', 'text']],
  },
  /** Copy-paste code in the target's language that computes `actual`. */
  {
    key: 'reproducer',
    column: 'reproducer',
    columnType: 'text',
    shown: 'detail',
    value: typed<string>(),
    fromFinding: (f: PointFinding) => f.reproducer,
  },
  /** For a point on a cut: the limits from both sides, named. */
  {
    key: 'limits',
    column: 'limits',
    columnType: 'jsonb',
    nullable: true,
    shown: 'detail',
    value: typed<{ sides: [string, string]; values: [WireComplex, WireComplex] } | null>(),
    fromFinding: (f: PointFinding) => f.limits ?? null,
  },
  /** A composed subject's intermediate values, library beside reference, in evaluation order. */
  {
    key: 'steps',
    column: 'steps',
    columnType: 'jsonb',
    nullable: true,
    shown: 'detail',
    value: typed<StepValue[] | null>(),
    fromFinding: (f: PointFinding) => f.steps ?? null,
  },
  /** The index in `steps` of the first step whose library value left the reference's. */
  {
    key: 'firstLeftStep',
    column: 'first_left_step',
    columnType: 'integer',
    nullable: true,
    shown: 'detail',
    value: typed<number | null>(),
    fromFinding: (f: PointFinding) => f.firstLeftStep ?? null,
    csv: [['first_left_step', (r: { firstLeftStep?: number | null }) => r.firstLeftStep ?? '', 'number']],
  },
  /** Where conventions disagree about the value, the rule that makes the expected one: a choice, not a fact. */
  {
    key: 'choice',
    column: 'choice',
    columnType: 'text',
    nullable: true,
    shown: 'detail',
    value: typed<string | null>(),
    fromFinding: (f: PointFinding) => f.choice ?? null,
    csv: [['choice', (r: { choice?: string | null }) => r.choice ?? '', 'text']],
  },
] as const;
