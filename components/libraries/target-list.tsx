import { Pressable, StyleSheet, Text, useWindowDimensions, View } from 'react-native';
import { useTargets } from '../../client/use-targets';
import { theme } from '../../constants/theme';
import { libraryKey } from '../../shared/library-key';
import type { TargetView } from '../../shared/target-view';
import { QueryState } from '../ui/query-state';
import { entryWords } from './entry-words';
import { STATED_CONVENTION_WORDS } from './stated-convention-words';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';

export interface TargetListProps {
  /** Opens one target's fingerprint and cut maps. */
  onOpenTarget: (name: string) => void;
  /** Opens the version matrix of a library (a target name without its version). */
  onOpenMatrix: (library: string) => void;
}

/** Libraries with more versions first: they are the ones with a version matrix. */
const installedCount = (versions: TargetView[]) => versions.filter((v) => v.installed).length;

const settingsWords = (s: TargetView['settings']) =>
  Object.entries(s)
    .map(([k, v]) => `${k}: ${String(v)}`)
    .join(' · ');

/**
 * The installed libraries, each with its versions side by side (npm aliases of older releases
 * count as versions of the same library), its settings and its entries; a library with two or more installed
 * versions offers its version matrix. One column on a phone, two on a wide screen.
 */
export function TargetList({ onOpenTarget, onOpenMatrix }: TargetListProps) {
  const targets = useTargets();
  const wide = useWindowDimensions().width >= theme.wide;
  if (targets.isPending) return <QueryState state="loading" />;
  if (targets.isError)
    return <QueryState state="error" message={targets.error.message} onRetry={() => void targets.refetch()} />;
  if (targets.data.length === 0)
    return (
      <QueryState
        state="empty"
        message="No targets recorded yet: the server records the installed libraries when it starts."
      />
    );

  const groups = new Map<string, TargetView[]>();
  for (const t of targets.data) {
    const key = libraryKey(t.name);
    groups.set(key, [...(groups.get(key) ?? []), t]);
  }

  return (
    <View style={[styles.grid, wide && styles.gridWide]}>
      {[...groups.entries()]
        .sort(([a, x], [b, y]) => installedCount(y) - installedCount(x) || a.localeCompare(b))
        .map(([key, versions]) => {
          const installed = versions.filter((v) => v.installed);
          return (
            <View key={key} style={[styles.card, wide && styles.cardWide]} testID={`library-${key}`}>
              <View style={styles.cardHead}>
                <SkText variant="heading" accessibilityRole="header" aria-level={2}>
                  {key}
                </SkText>
                <SkText variant="caption" tone="inkFaint">
                  {installed.length} installed version{installed.length === 1 ? '' : 's'}
                </SkText>
              </View>
              {versions.map((t) => (
                <Pressable
                  key={t.name}
                  accessibilityRole="link"
                  // Named by the words the row shows, under its library's heading (WCAG 2.5.3: a person
                  // may name the link by what they read on it; a label of its own never matched them
                  // as axe-core reads them, block by block).
                  disabled={!t.installed}
                  onPress={() => onOpenTarget(t.name)}
                  style={({ pressed }) => [styles.version, pressed && styles.pressed]}
                >
                  <View style={styles.versionText}>
                    <SkText variant="monoBody" style={!t.installed && styles.gone}>
                      {t.version}
                    </SkText>
                    <Text style={styles.settings}>{settingsWords(t.settings) || 'no settings'}</Text>
                    {entryWords(t.entries) ? <Text style={styles.settings}>{entryWords(t.entries)}</Text> : null}
                    {t.convention ? <Text style={styles.settings}>{STATED_CONVENTION_WORDS[t.convention]}</Text> : null}
                    {t.installed ? null : (
                      <Text style={styles.settings}>× not installed any more: nothing can be computed for it</Text>
                    )}
                  </View>
                  {t.installed ? (
                    <SkText variant="smallLabel" tone="accent">
                      Fingerprint →
                    </SkText>
                  ) : null}
                </Pressable>
              ))}
              {installed.length >= 2 ? (
                <Pressable
                  accessibilityRole="link"
                  onPress={() => onOpenMatrix(key)}
                  style={({ pressed }) => [styles.matrix, pressed && styles.pressed]}
                >
                  <SkText variant="smallLabel" tone="ink">
                    ∆ Version matrix of {key}: what changed between these {installed.length} versions →
                  </SkText>
                </Pressable>
              ) : (
                <Text style={styles.single}>One installed version: nothing to compare across versions.</Text>
              )}
            </View>
          );
        })}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { gap: theme.space(4) },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start' },
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(1),
  },
  cardWide: { flexBasis: '48%', flexGrow: 1 },
  cardHead: {
    flexDirection: 'row',
    alignItems: 'baseline',
    justifyContent: 'space-between',
    flexWrap: 'wrap',
    gap: theme.space(2),
    marginBottom: theme.space(2),
  },
  version: {
    minHeight: theme.touch,
    flexDirection: 'row',
    alignItems: 'center',
    gap: theme.space(3),
    paddingVertical: theme.space(2),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
  },
  pressed: { backgroundColor: theme.color.paper },
  versionText: { flex: 1, gap: 2 },
  gone: { color: theme.color.inkFaint, textDecorationLine: 'line-through' },
  settings: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkSoft },
  matrix: {
    minHeight: theme.touch,
    justifyContent: 'center',
    marginTop: theme.space(2),
    paddingHorizontal: theme.space(3),
    borderRadius: theme.radius,
    backgroundColor: theme.color.accentSoft,
  },
  single: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkFaint, marginTop: theme.space(2) },
});
