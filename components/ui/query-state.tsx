import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { theme } from '../../constants/theme';
import { ActionButton } from './action-button';
import { SkText } from './sk-text';

/** Loading, error and empty states, worded the same on every screen. */
export function QueryState({
  state,
  message,
  onRetry,
}: {
  state: 'loading' | 'error' | 'empty';
  message?: string;
  onRetry?: () => void;
}) {
  return (
    <View style={styles.box} accessibilityLiveRegion="polite">
      {state === 'loading' ? <ActivityIndicator color={theme.color.accent} accessibilityLabel="Loading" /> : null}
      <SkText variant="body" tone="inkSoft" style={[styles.text, state === 'error' && styles.error]}>
        {state === 'loading'
          ? 'Loading…'
          : state === 'error'
            ? `× ${message ?? 'Could not load this.'}`
            : (message ?? 'Nothing here yet.')}
      </SkText>
      {state === 'error' && onRetry ? <ActionButton label="Try again" tone="quiet" onPress={onRetry} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    padding: theme.space(6),
    alignItems: 'center',
    gap: theme.space(3),
    borderWidth: 1,
    borderColor: theme.color.rule,
    borderStyle: 'dashed',
    borderRadius: theme.radius,
  },
  text: { textAlign: 'center' },
  error: { color: theme.color.danger },
});
