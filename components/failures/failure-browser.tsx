import { StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import type { FailureFilters } from '../../client/failure-filters';
import { failureQueryString } from '../../client/failure-query-string';
import { useFailures } from '../../client/use-failures';
import { useStoredChoice } from '../../client/use-stored-choice';
import { theme } from '../../constants/theme';
import type { DecisionMark } from '../../shared/decision-mark';
import { ActionButton } from '../ui/action-button';
import { ChipGroup } from '../ui/chip-group';
import { SkText } from '../ui/sk-text';
import { ColumnChooser } from './column-chooser';
import { ExportLink } from './export-link';
import { FailureCard } from './failure-card';
import { FAILURE_COLUMNS, type FailureColumnId } from './failure-columns';
import { FailureFiltersPanel } from './failure-filters-panel';
import { FailureTable } from './failure-table';
import { QueryState } from '../ui/query-state';
import { filterErrors } from './filter-errors';

const COLUMN_IDS = FAILURE_COLUMNS.map((c) => c.id);
const DEFAULT_COLUMNS: FailureColumnId[] = ['id', 'suite', 'target', 'path', 'z', 'diagnosis', 'ulps', 'new'];
const COLUMNS_STORAGE_KEY = 'sheetkeeper.failure-table.columns';

/**
 * The failure table: filters (kept by the caller, in the address), sort, keyed pages with "Load
 * more", the CSV of the same filters, and the rows as a table with chosen columns on a wide
 * screen or as cards on a phone.
 */
export function FailureBrowser({
  filters,
  onChange,
  dropped = [],
}: {
  filters: FailureFilters;
  onChange: (next: FailureFilters) => void;
  dropped?: string[];
}) {
  const wide = useWindowDimensions().width >= theme.wide;
  const failures = useFailures(filters);
  const [columns, setColumns] = useStoredChoice<FailureColumnId>(COLUMNS_STORAGE_KEY, COLUMN_IDS, DEFAULT_COLUMNS);
  const rows = failures.data?.pages.flatMap((p) => p.failures) ?? [];
  const decisions = Object.assign({}, ...(failures.data?.pages.map((p) => p.decisions) ?? [])) as Record<
    string,
    DecisionMark
  >;
  const exportable = Boolean(filters.run || filters.suite || filters.target);
  // A filter the server refused (a short run id that names no run, or two): its rule goes beside its field.
  const refused = filterErrors(failures.error);

  return (
    <View style={styles.root}>
      {dropped.length > 0 ? (
        <Text accessibilityRole="alert" style={styles.warning}>
          × The link&apos;s {dropped.join(', ')} could not be read and {dropped.length === 1 ? 'is' : 'are'} not
          applied.
        </Text>
      ) : null}
      <FailureFiltersPanel filters={filters} onChange={onChange} compact={!wide} refused={refused} />
      <View style={styles.toolbar}>
        <ChipGroup
          label="Branch findings first, then"
          value={filters.sort ?? 'id'}
          onChange={(v) => onChange({ ...filters, sort: v === 'ulps' ? 'ulps' : undefined })}
          options={[
            { value: 'id', text: 'newest first' },
            { value: 'ulps', text: 'largest error first' },
          ]}
        />
        <View style={styles.tools}>
          <ExportLink
            label="Export CSV"
            href={`/api/failures/export.csv?${failureQueryString({ ...filters, sort: undefined })}`}
            disabledReason={exportable ? undefined : 'Filter by a run, suite or target to export.'}
          />
          {wide ? (
            <ColumnChooser
              options={FAILURE_COLUMNS.map((c) => ({ id: c.id, title: c.title, fixed: c.fixed }))}
              shown={columns}
              onChange={setColumns}
            />
          ) : null}
        </View>
      </View>
      <SkText variant="caption" style={styles.note}>
        Only points that did not pass are listed, each with the suite version, target and convention it was judged
        under. A short or empty table is evidence about the points and conventions those suites checked, not a
        certification of the library.
      </SkText>
      {failures.isPending ? (
        <QueryState state="loading" />
      ) : failures.isError && Object.keys(refused).length > 0 ? (
        <QueryState state="error" message="No failures shown: change the filter marked above." />
      ) : failures.isError ? (
        <QueryState state="error" message={failures.error.message} onRetry={() => void failures.refetch()} />
      ) : rows.length === 0 ? (
        <QueryState
          state="empty"
          message={
            Object.keys(filters).some((k) => k !== 'sort')
              ? 'No failures match these filters.'
              : 'No failures stored yet: no run has found a failing point.'
          }
        />
      ) : (
        <View style={styles.results}>
          <SkText variant="smallLabel" accessibilityLiveRegion="polite">
            {rows.length} {rows.length === 1 ? 'failure' : 'failures'} shown
            {failures.hasNextPage ? ', more to load' : ', all loaded'}
          </SkText>
          {wide ? (
            <FailureTable failures={rows} columns={columns} decisions={decisions} />
          ) : (
            <View style={styles.cards}>
              {rows.map((f) => (
                <FailureCard key={f.id} failure={f} decision={decisions[f.id]} />
              ))}
            </View>
          )}
          {failures.isFetchNextPageError ? (
            <Text style={styles.warning}>× The next page could not be loaded; try again.</Text>
          ) : null}
          {failures.hasNextPage ? (
            <ActionButton
              label="Load more"
              tone="quiet"
              busy={failures.isFetchingNextPage}
              onPress={() => void failures.fetchNextPage()}
            />
          ) : null}
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  root: { gap: theme.space(4) },
  toolbar: {
    flexDirection: 'row',
    flexWrap: 'wrap',
    justifyContent: 'space-between',
    alignItems: 'flex-end',
    gap: theme.space(3),
  },
  tools: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3), alignItems: 'flex-start' },
  note: { lineHeight: 19 },
  results: { gap: theme.space(3) },
  cards: { gap: theme.space(3) },
  warning: {
    fontFamily: theme.font.medium,
    color: theme.color.danger,
    backgroundColor: theme.color.dangerSoft,
    padding: theme.space(3),
    borderRadius: theme.radius,
  },
});
