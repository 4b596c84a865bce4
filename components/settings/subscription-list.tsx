import { StyleSheet, Text, View } from 'react-native';
import { refusalMessage } from '../../client/refusal-message';
import { useSaveSubscriptions } from '../../client/use-save-subscriptions';
import { useSubscriptions } from '../../client/use-subscriptions';
import { theme } from '../../constants/theme';
import { OnOffSwitch } from '../ui/on-off-switch';
import { QueryState } from '../ui/query-state';
import { SlashWrappedName } from './slash-wrapped-name';
import { FailureAlert } from '../ui/failure-alert';

/** Which libraries' regressions mail me: one switch per library, saved as it is flipped. */
export function SubscriptionList() {
  const subscriptions = useSubscriptions();
  const save = useSaveSubscriptions();
  if (subscriptions.isPending) return <QueryState state="loading" />;
  if (subscriptions.isError)
    return (
      <QueryState state="error" message={subscriptions.error.message} onRetry={() => void subscriptions.refetch()} />
    );
  const { targetKeys, available } = subscriptions.data;
  // A library I subscribed to may no longer be installed; it stays listed so I can leave it.
  const libraries = Array.from(new Set([...available, ...targetKeys])).sort();
  if (libraries.length === 0)
    return (
      <QueryState state="empty" message="No libraries known yet: they appear once the server has found its targets." />
    );
  const failure = refusalMessage(save.error, 'The server could not be reached; the change was undone.');

  return (
    <View style={styles.list} testID="subscription-list">
      {failure ? <FailureAlert message={failure} style={styles.failure} /> : null}
      {libraries.map((key) => {
        const on = targetKeys.includes(key);
        return (
          <View key={key} style={styles.row}>
            <View style={styles.words}>
              <SlashWrappedName name={key} style={styles.name} />
              {!available.includes(key) ? (
                <Text style={styles.gone}>− no longer among this server&apos;s targets</Text>
              ) : null}
            </View>
            <OnOffSwitch
              value={on}
              onChange={(next) => save.mutate(next ? [...targetKeys, key].sort() : targetKeys.filter((k) => k !== key))}
              accessibilityLabel={`Mail me regressions of ${key}`}
              onWord="Mail me"
              offWord="Quiet"
            />
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: 0 },
  failure: { marginBottom: theme.space(2) },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    justifyContent: 'space-between',
    gap: theme.space(3),
    borderTopWidth: 1,
    borderTopColor: theme.color.rule,
    paddingVertical: theme.space(1),
  },
  words: { flex: 1, minWidth: 0 },
  name: { fontFamily: theme.font.mono, fontSize: theme.size.body, color: theme.color.ink },
  gone: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkSoft },
});
