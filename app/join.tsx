import { useLocalSearchParams, useRouter } from 'expo-router';
import { JoinScreen } from '../components/join/join-screen';
import { PageTitle } from '../components/ui/page-title';

/** Public: the page an invitation or a password-reset mail links to (`/join?token=…`). */
export default function JoinRoute() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const router = useRouter();
  return (
    <>
      <PageTitle title="Join or reset password" />
      <JoinScreen token={typeof token === 'string' && token !== '' ? token : null} onDone={() => router.replace('/')} />
    </>
  );
}
