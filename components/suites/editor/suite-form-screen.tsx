import { router } from 'expo-router';
import { useMe } from '../../../client/use-me';
import { useSuite } from '../../../client/use-suite';
import { emptySuiteDraft } from './empty-suite-draft';
import { QueryState } from '../../ui/query-state';
import { SuiteForm } from './suite-form';
import { suiteToDraft } from './suite-to-draft';

/** The suite form for a new suite, or for the latest version of `slug` (a new draft version after an approved one). */
export function SuiteFormScreen({ slug }: { slug: string | null }) {
  const suite = useSuite(slug ?? undefined);
  const me = useMe();
  const done = (saved: string) => router.replace(`/suites/${saved}`);
  // Unsaved work is kept per user, so a shared browser never offers one author another's draft.
  const keyFor = (what: string) => `sheetkeeper.suite-draft.${me.data?.id ?? 'anyone'}.${what}`;
  if (me.isPending) return <QueryState state="loading" />;
  if (!slug) return <SuiteForm initial={emptySuiteDraft()} editing={null} draftKey={keyFor('new')} onDone={done} />;
  if (suite.isPending) return <QueryState state="loading" />;
  if (suite.isError)
    return <QueryState state="error" message={suite.error.message} onRetry={() => void suite.refetch()} />;
  const latest = suite.data[0];
  if (!latest) return <QueryState state="empty" message="This suite has no versions." />;
  if (latest.status === 'submitted')
    return (
      <QueryState
        state="error"
        message={`Version ${latest.version} is waiting for review; it can be edited once reviewed.`}
      />
    );
  // Per version: work begun on version 2 is not offered over version 3.
  return (
    <SuiteForm
      key={latest.id}
      initial={suiteToDraft(latest.body)}
      editing={slug}
      draftKey={keyFor(`${slug}.${latest.id}`)}
      onDone={done}
    />
  );
}
