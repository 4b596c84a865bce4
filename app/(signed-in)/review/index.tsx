import { useLocalSearchParams } from 'expo-router';
import { useMe } from '../../../client/use-me';
import { QueryState } from '../../../components/ui/query-state';
import { ReviewQueue } from '../../../components/review/review-queue';
import { ScreenBody } from '../../../components/ui/screen-body';

export default function ReviewScreen() {
  const { data: me } = useMe();
  // Set by the review form after a decision (suite-review.tsx); the confirmation reads the version back.
  const { reviewed, version } = useLocalSearchParams<{ reviewed?: string; version?: string }>();
  const decided =
    reviewed && /^\d{1,9}$/.test(version ?? '') ? { slug: reviewed, version: Number(version) } : undefined;
  if (!me) return null;
  return (
    <ScreenBody
      title="Review"
      lead="Submitted suite versions. Approving one lets plans run it; nobody reviews a version they wrote."
    >
      {me.role === 'reviewer' || me.role === 'admin' ? (
        <ReviewQueue reviewed={decided} />
      ) : (
        <QueryState state="error" message="Only reviewers and admins review suites." />
      )}
    </ScreenBody>
  );
}
