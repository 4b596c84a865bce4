import { router } from 'expo-router';
import { useMe } from '../../../client/use-me';
import { ScreenBody } from '../../../components/ui/screen-body';
import { TargetList } from '../../../components/libraries/target-list';
import { TargetSourceForm } from '../../../components/libraries/target-source-form';
import { TargetSourceList } from '../../../components/libraries/target-source-list';
import { TitledPanel } from '../../../components/ui/titled-panel';
import { WorkerList } from '../../../components/libraries/worker-list';

/** Libraries: the installed targets by library, each version with its settings; then the targets admins added; then the workers running now and their targets. */
export default function LibrariesScreen() {
  const { data: me } = useMe();
  const admin = me?.role === 'admin';
  return (
    <ScreenBody
      title="Libraries"
      lead="The libraries installed on this server, every version side by side with its settings. Open a version for the convention it appears to follow on each cut and where its cuts really are; open a library's version matrix for what changed between releases."
    >
      <TargetList
        onOpenTarget={(name) => router.push({ pathname: '/libraries/target', params: { name } })}
        onOpenMatrix={(library) => router.push({ pathname: '/libraries/versions', params: { library } })}
      />
      <TitledPanel
        title="Added by admins"
        lead={
          admin
            ? 'Add a library version, your working copy or a program in any language. The server gets it ready in the background; once ready, it is listed above and plans can name it.'
            : 'Library versions, working copies and programs that admins added. Once ready, they are listed above and plans can name them.'
        }
        testID="added-targets"
      >
        {admin ? <TargetSourceForm /> : null}
        <TargetSourceList canRemove={admin} />
      </TitledPanel>
      <TitledPanel
        title="Workers running now"
        lead="The processes that run checks, on this machine or others, each with the targets it has. A check waits until a worker that has its target is running."
        testID="live-workers-panel"
      >
        <WorkerList />
      </TitledPanel>
    </ScreenBody>
  );
}
