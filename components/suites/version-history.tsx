import { Pressable, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import type { SuiteVersionView } from '../../shared/suite-version-view';
import { SkText } from '../ui/sk-text';
import { authorshipText } from './authorship-text';
import { SuiteStatusLabel } from './suite-status-label';

const when = (iso: string | null) =>
  iso
    ? new Date(iso).toLocaleString('en-GB', {
        day: 'numeric',
        month: 'short',
        year: 'numeric',
        hour: '2-digit',
        minute: '2-digit',
      })
    : null;

/** Every version of a suite, newest first, with who wrote and reviewed it and the reviewer's comment; choosing one shows it. */
export function VersionHistory({
  versions,
  selected,
  onSelect,
}: {
  versions: SuiteVersionView[];
  selected: number;
  onSelect: (version: number) => void;
}) {
  return (
    <View style={styles.list} role="group" aria-label="Versions">
      {versions.map((v) => (
        <Pressable
          key={v.version}
          accessibilityRole="button"
          aria-current={v.version === selected ? 'true' : undefined}
          onPress={() => onSelect(v.version)}
          style={[styles.item, v.version === selected && styles.selected]}
          testID={`version-${v.version}`}
        >
          <View style={styles.head}>
            <SuiteStatusLabel status={v.status} version={v.version} />
            {v.version === selected ? (
              <SkText variant="smallLabel" tone="accent">
                ← shown
              </SkText>
            ) : null}
          </View>
          <SkText variant="caption">
            {authorshipText(v)} · {when(v.createdAt)}
            {v.submittedAt ? ` · submitted ${when(v.submittedAt)}` : ''}
          </SkText>
          {v.reviewer ? (
            <SkText variant="caption">
              reviewed by {v.reviewer.displayName} · {when(v.reviewedAt)}
            </SkText>
          ) : null}
          {v.reviewComment ? (
            <SkText variant="caption" tone="ink" style={styles.comment}>
              “{v.reviewComment}”
            </SkText>
          ) : null}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  item: {
    minHeight: theme.touch,
    padding: theme.space(3),
    gap: theme.space(1),
    borderRadius: theme.radius,
    borderWidth: 1,
    borderColor: theme.color.rule,
    backgroundColor: theme.color.panel,
  },
  selected: { borderColor: theme.color.accent, borderWidth: 2 },
  head: { flexDirection: 'row', alignItems: 'center', gap: theme.space(2) },
  comment: { fontStyle: 'italic', borderLeftWidth: 3, borderLeftColor: theme.color.focus, paddingLeft: theme.space(2) },
});
