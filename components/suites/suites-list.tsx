import { Link } from 'expo-router';
import { useState } from 'react';
import { Pressable, StyleSheet, TextInput, View } from 'react-native';
import { useSuites } from '../../client/use-suites';
import { theme } from '../../constants/theme';
import { SUITE_STATUSES, type SuiteStatus } from '../../shared/suite-status';
import { ChipGroup } from '../ui/chip-group';
import { INPUT_BOX_STYLE } from '../ui/input-box-style';
import { QueryState } from '../ui/query-state';
import { SkText } from '../ui/sk-text';
import { SuiteCard } from './suite-card';
import { SuiteFileUpload } from './suite-file-upload';

const STATUS_OPTIONS = [
  { value: 'any', text: 'any status' },
  ...SUITE_STATUSES.map((s) => ({ value: s, text: s.replace('-', ' ') })),
] as const;

/** Every suite with its latest version: search, filter by status, write a new one or upload a file. */
export function SuitesList() {
  const [q, setQ] = useState('');
  const [status, setStatus] = useState<SuiteStatus | 'any'>('any');
  const suites = useSuites({ q, status: status === 'any' ? undefined : status });
  return (
    <View style={styles.box}>
      <View style={styles.actions}>
        <Link href="/suites/new" asChild>
          <Pressable
            accessibilityRole="link"
            accessibilityLabel="New suite"
            style={StyleSheet.flatten(styles.newButton)}
          >
            <SkText variant="label" tone="accentInk">
              + New suite
            </SkText>
          </Pressable>
        </Link>
        <SuiteFileUpload />
      </View>
      <View style={styles.search}>
        <SkText variant="smallLabel">Search</SkText>
        <TextInput
          accessibilityLabel="Search suites by id, title or subject"
          placeholder="id, title or subject"
          value={q}
          onChangeText={setQ}
          autoCapitalize="none"
          autoCorrect={false}
          style={styles.input}
        />
      </View>
      <ChipGroup
        label="Latest version"
        options={STATUS_OPTIONS}
        value={status}
        onChange={(v) => setStatus(v as SuiteStatus | 'any')}
      />
      {suites.isPending ? <QueryState state="loading" /> : null}
      {suites.isError ? (
        <QueryState state="error" message={suites.error.message} onRetry={() => void suites.refetch()} />
      ) : null}
      {suites.data && suites.data.length === 0 ? (
        <QueryState
          state="empty"
          message={
            q || status !== 'any' ? 'No suite matches this search.' : 'No suites yet: write one or upload a file.'
          }
        />
      ) : null}
      {suites.data && suites.data.length > 0 ? (
        <>
          <SkText variant="caption" tone="inkFaint">
            {suites.data.length} {suites.data.length === 1 ? 'suite' : 'suites'}
          </SkText>
          <View style={styles.grid}>
            {suites.data.map((s) => (
              <SuiteCard key={s.slug} suite={s} />
            ))}
          </View>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(4) },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3), alignItems: 'flex-start' },
  newButton: {
    minHeight: theme.touch,
    paddingHorizontal: theme.space(5),
    borderRadius: theme.radius,
    backgroundColor: theme.color.accent,
    justifyContent: 'center',
  },
  search: { gap: theme.space(1) },
  input: INPUT_BOX_STYLE,
  grid: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(3) },
});
