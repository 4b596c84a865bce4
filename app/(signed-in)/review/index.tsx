import { useMe } from '../../../client/use-me';
import { QueryState } from '../../../components/ui/query-state';
import { ReviewQueue } from '../../../components/review/review-queue';
import { ScreenBody } from '../../../components/ui/screen-body';

export default function ReviewScreen() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <ScreenBody
      title="Review"
      lead="Submitted suite versions. Approving one lets plans run it; nobody reviews a version they wrote."
    >
      {me.role === 'reviewer' || me.role === 'admin' ? (
        <ReviewQueue />
      ) : (
        <QueryState state="error" message="Only reviewers and admins review suites." />
      )}
    </ScreenBody>
  );
}
