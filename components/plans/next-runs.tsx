import { StyleSheet, View } from 'react-native';
import { formatTimeInZone } from '../../client/format-time-in-zone';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';

/** The next times a schedule fires, read in its own time zone, with how far away each is. */
export function NextRuns({
  nextRuns,
  timeZone,
  working = false,
  testID,
}: {
  nextRuns: string[] | null;
  timeZone: string;
  working?: boolean;
  testID?: string;
}) {
  return (
    <View style={styles.box} accessibilityLiveRegion="polite" testID={testID} aria-busy={working}>
      <SkText variant="smallLabel" tone="inkFaint" style={styles.head}>
        Next runs{working ? ' …' : ''}
      </SkText>
      {nextRuns === null ? (
        <SkText variant="caption">
          {working ? 'Working out the next times…' : '— no times until the expression is valid'}
        </SkText>
      ) : nextRuns.length === 0 ? (
        <SkText variant="caption">— none: this schedule does not run</SkText>
      ) : (
        nextRuns.map((iso) => {
          const { when, distance } = formatTimeInZone(iso, timeZone);
          return (
            <View key={iso} style={styles.row}>
              <SkText variant="body" tone="accent">
                •
              </SkText>
              <SkText variant="monoBody" style={working && styles.stale}>
                {when}
              </SkText>
              <SkText variant="caption">{distance}</SkText>
            </View>
          );
        })
      )}
      {nextRuns && nextRuns.length > 0 ? (
        <SkText variant="caption" tone="inkFaint">
          Times in {timeZone}
        </SkText>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(1) },
  head: { textTransform: 'uppercase', letterSpacing: 0.8 },
  row: { flexDirection: 'row', alignItems: 'baseline', gap: theme.space(2), flexWrap: 'wrap' },
  stale: { color: theme.color.inkFaint },
});
