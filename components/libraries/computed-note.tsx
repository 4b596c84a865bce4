import { StyleSheet, Text } from 'react-native';
import { theme } from '../../constants/theme';
import type { ComputedAnswer } from '../../shared/computed-answer';

const seconds = (ms: number) => (ms < 1000 ? `${ms} ms` : `${(ms / 1000).toFixed(1)} s`);

/** Says where an answer of the harness came from: computed just now, or kept on the server from an earlier request. */
export function ComputedNote({ answer }: { answer: ComputedAnswer }) {
  return (
    <Text style={styles.note}>
      {answer.fromCache
        ? `Kept on the server from an earlier request (it took ${seconds(answer.computedMs)} to compute for this installed version).`
        : `Computed on the server just now in ${seconds(answer.computedMs)}; kept there for the next visit.`}
    </Text>
  );
}

const styles = StyleSheet.create({
  note: { fontFamily: theme.font.regular, fontSize: 12, color: theme.color.inkFaint },
});
