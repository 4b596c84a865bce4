import { router } from 'expo-router';
import { useSuite } from '../client/use-suite';
import { emptySuiteDraft } from './empty-suite-draft';
import { QueryState } from './query-state';
import { SuiteForm } from './suite-form';
import { suiteToDraft } from './suite-to-draft';

/** The suite form for a new suite, or for the latest version of `slug` (a new draft version after an approved one). */
export function SuiteFormScreen({ slug }: { slug: string | null }) {
  const suite = useSuite(slug ?? undefined);
  const done = (saved: string) => router.replace(`/suites/${saved}`);
  if (!slug) return <SuiteForm initial={emptySuiteDraft()} editing={null} onDone={done} />;
  if (suite.isPending) return <QueryState state="loading" />;
  if (suite.isError) return <QueryState state="error" message={suite.error.message} onRetry={() => void suite.refetch()} />;
  const latest = suite.data[0];
  if (!latest) return <QueryState state="empty" message="This suite has no versions." />;
  if (latest.status === 'submitted') return <QueryState state="error" message={`Version ${latest.version} is waiting for review; it can be edited once reviewed.`} />;
  return <SuiteForm key={latest.id} initial={suiteToDraft(latest.body)} editing={slug} onDone={done} />;
}
