import { router } from 'expo-router';
import { ScreenBody } from '../../../components/ui/screen-body';
import { TargetList } from '../../../components/libraries/target-list';

/** Libraries: the installed targets by library, each version with its settings. */
export default function LibrariesScreen() {
  return (
    <ScreenBody
      title="Libraries"
      lead="The libraries installed on this server, every version side by side with its settings. Open a version for the convention it appears to follow on each cut and where its cuts really are; open a library's version matrix for what changed between releases."
    >
      <TargetList
        onOpenTarget={(name) => router.push({ pathname: '/libraries/target', params: { name } })}
        onOpenMatrix={(library) => router.push({ pathname: '/libraries/versions', params: { library } })}
      />
    </ScreenBody>
  );
}
