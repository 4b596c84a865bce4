import { router, useLocalSearchParams } from 'expo-router';
import { CrumbLink } from '../../../components/ui/crumb-link';
import { LibraryVersionMatrix } from '../../../components/libraries/library-version-matrix';
import { QueryState } from '../../../components/ui/query-state';
import { ScreenBody } from '../../../components/ui/screen-body';

/** The version matrix of one library: which values changed in which installed version. */
export default function VersionsScreen() {
  const { library } = useLocalSearchParams<{ library?: string }>();
  return (
    <ScreenBody
      title={library ? `${library}: version matrix` : 'Version matrix'}
      lead="Every approved suite run on every installed version of this library, oldest first, and each point whose value changed from one version to the next."
    >
      <CrumbLink label="Libraries" onPress={() => router.navigate('/libraries')} />
      {library ? (
        <LibraryVersionMatrix library={library} />
      ) : (
        <QueryState state="error" message="No library named in the address." />
      )}
    </ScreenBody>
  );
}
