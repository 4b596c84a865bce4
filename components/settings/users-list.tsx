import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { useUsers } from '../../client/use-users';
import { theme } from '../../constants/theme';
import { ACCOUNT_LINK_LIFETIME_HOURS } from '../../shared/account-link-lifetime-hours';
import type { PublicUser } from '../../shared/public-user';
import { QueryState } from '../ui/query-state';
import { ColumnHead } from '../ui/column-head';
import { TitledPanel } from '../ui/titled-panel';
import { InviteForm } from './invite-form';
import { OpenInvitations } from './open-invitations';
import { USER_COLUMNS } from './user-columns';
import { UserRow } from './user-row';

/** The admin's users screen: the invitation form, then every account (cards on a phone, rows on a wide screen). */
export function UsersList({ me }: { me: PublicUser }) {
  const users = useUsers();
  const wide = useWindowDimensions().width >= theme.wide;

  return (
    <View style={styles.list}>
      <TitledPanel
        title="Invite someone"
        lead={`They get a mail with a one-time link to choose their name and password; the link works for ${ACCOUNT_LINK_LIFETIME_HOURS.invitation / 24} days.`}
      >
        <InviteForm />
        <OpenInvitations />
      </TitledPanel>
      {users.isPending ? (
        <QueryState state="loading" />
      ) : users.isError ? (
        <QueryState state="error" message={users.error.message} onRetry={() => void users.refetch()} />
      ) : users.data.length === 0 ? (
        <QueryState state="empty" message="No users yet." />
      ) : (
        <View>
          {wide ? (
            <View style={[styles.row, styles.headRow]}>
              <ColumnHead style={styles.nameCol}>Name and e-mail</ColumnHead>
              <ColumnHead style={styles.roleCol}>Role</ColumnHead>
              <ColumnHead style={styles.actionCol}>Account</ColumnHead>
              <ColumnHead style={styles.statusCol}>Last change</ColumnHead>
            </View>
          ) : null}
          <View style={wide ? undefined : styles.cards}>
            {users.data.map((user) => (
              <UserRow key={user.id} user={user} isMe={user.id === me.id} wide={wide} />
            ))}
          </View>
        </View>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(4) },
  cards: { gap: theme.space(2) },
  row: {
    flexDirection: 'row',
    gap: theme.space(3),
    paddingVertical: theme.space(2),
    paddingHorizontal: theme.space(3),
  },
  headRow: { backgroundColor: 'transparent' },
  nameCol: USER_COLUMNS.name,
  roleCol: USER_COLUMNS.role,
  actionCol: USER_COLUMNS.account,
  statusCol: USER_COLUMNS.status,
});
