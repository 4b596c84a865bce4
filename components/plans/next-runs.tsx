import { StyleSheet, Text, View } from 'react-native';
import { formatTimeInZone } from '../../client/format-time-in-zone';
import { theme } from '../../constants/theme';

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
      <Text style={styles.head}>Next runs{working ? ' …' : ''}</Text>
      {nextRuns === null ? (
        <Text style={styles.none}>
          {working ? 'Working out the next times…' : '— no times until the expression is valid'}
        </Text>
      ) : nextRuns.length === 0 ? (
        <Text style={styles.none}>— none: this schedule does not run</Text>
      ) : (
        nextRuns.map((iso) => {
          const { when, distance } = formatTimeInZone(iso, timeZone);
          return (
            <View key={iso} style={styles.row}>
              <Text style={styles.bullet}>•</Text>
              <Text style={[styles.when, working && styles.stale]}>{when}</Text>
              <Text style={styles.distance}>{distance}</Text>
            </View>
          );
        })
      )}
      {nextRuns && nextRuns.length > 0 ? <Text style={styles.zone}>Times in {timeZone}</Text> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: theme.space(1) },
  head: {
    fontFamily: theme.font.medium,
    fontSize: theme.size.small,
    color: theme.color.inkFaint,
    textTransform: 'uppercase',
    letterSpacing: 0.8,
  },
  row: { flexDirection: 'row', alignItems: 'baseline', gap: theme.space(2), flexWrap: 'wrap' },
  bullet: { fontFamily: theme.font.regular, fontSize: theme.size.body, color: theme.color.accent },
  when: { fontFamily: theme.font.mono, fontSize: theme.size.body, color: theme.color.ink },
  stale: { color: theme.color.inkFaint },
  distance: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
  none: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkSoft },
  zone: { fontFamily: theme.font.regular, fontSize: theme.size.small, color: theme.color.inkFaint },
});
