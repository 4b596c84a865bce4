import { useMe } from '../../client/use-me';
import { QueryState } from '../../components/ui/query-state';
import { ScreenBody } from '../../components/ui/screen-body';
import { UsersList } from '../../components/settings/users-list';

export default function UsersScreen() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <ScreenBody title="Users" lead="Everyone who can sign in, and the role that decides what they may do.">
      {me.role === 'admin' ? <UsersList me={me} /> : <QueryState state="error" message="Only admins can see users." />}
    </ScreenBody>
  );
}
