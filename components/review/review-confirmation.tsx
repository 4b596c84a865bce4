import { StyleSheet, View } from 'react-native';
import { useSuite } from '../../client/use-suite';
import { theme } from '../../constants/theme';
import { SkText } from '../ui/sk-text';

/**
 * What the reviewer just decided, above the queue they return to: the suite's title, its id and
 * version, and the decision, all read back from the server (the link only names the version), so
 * an address typed by hand cannot make the screen claim a decision nobody took.
 */
export function ReviewConfirmation({ slug, version }: { slug: string; version: number }) {
  const suite = useSuite(slug);
  const decided = suite.data?.find((v) => v.version === version);
  if (!decided || (decided.status !== 'approved' && decided.status !== 'changes-requested')) return null;
  const title = `“${decided.body.title}” (${slug}, version ${version})`;
  return (
    <View style={styles.box} accessibilityRole="alert" testID="review-confirmation">
      <SkText variant="label" tone="ink">
        {decided.status === 'approved'
          ? `Approved ${title}. Plans that include it run this version from their next run.`
          : `Changes requested on ${title}. ${decided.author.displayName} sees your comment on the suite's page.`}
      </SkText>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { backgroundColor: theme.color.accentSoft, padding: theme.space(3), borderRadius: theme.radius },
});
