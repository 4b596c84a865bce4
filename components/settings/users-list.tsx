import { Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import { ApiRequestError } from '../../client/api-request-error';
import { useChangeRole } from '../../client/use-change-role';
import { useUsers } from '../../client/use-users';
import { theme } from '../../constants/theme';
import { ROLES, type Role } from '../../shared/roles';
import type { PublicUser } from '../../shared/public-user';
import { QueryState } from '../ui/query-state';
import { ColumnHead } from '../ui/column-head';
import { SkText } from '../ui/sk-text';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';
import { FailureAlert } from '../ui/failure-alert';
import { CHIP_BOX_STYLE } from '../ui/chip-box-style';

/** Admin list of users: cards on a phone, rows on a wide screen; the role is changed in place. */
export function UsersList({ me }: { me: PublicUser }) {
  const users = useUsers();
  const changeRole = useChangeRole();
  const wide = useWindowDimensions().width >= theme.wide;

  if (users.isPending) return <QueryState state="loading" />;
  if (users.isError)
    return <QueryState state="error" message={users.error.message} onRetry={() => void users.refetch()} />;
  if (users.data.length === 0) return <QueryState state="empty" message="No users yet." />;

  const failure =
    changeRole.error instanceof ApiRequestError ? changeRole.error.body.message : changeRole.error?.message;

  return (
    <View style={styles.list}>
      {failure ? <FailureAlert message={failure} glyph="×" /> : null}
      {wide ? (
        <View style={[styles.row, styles.headRow]}>
          <ColumnHead style={styles.nameCol}>Name</ColumnHead>
          <ColumnHead style={styles.emailCol}>E-mail</ColumnHead>
          <ColumnHead style={styles.roleCol}>Role</ColumnHead>
        </View>
      ) : null}
      {users.data.map((user) => (
        <View key={user.id} style={wide ? styles.row : styles.card} testID={`user-${user.email}`}>
          <View style={wide ? styles.nameCol : undefined}>
            <SkText variant="label">
              {user.displayName}
              {user.id === me.id ? ' (you)' : ''}
            </SkText>
            {wide ? null : (
              <SkText variant="mono" tone="inkSoft">
                {user.email}
              </SkText>
            )}
          </View>
          {wide ? (
            <SkText variant="mono" tone="inkSoft" style={styles.emailCol}>
              {user.email}
            </SkText>
          ) : null}
          <View style={[styles.roleCol, styles.roleCell]}>
            <View
              style={styles.chips}
              accessibilityRole="radiogroup"
              accessibilityLabel={`Role of ${user.displayName}`}
            >
              {ROLES.map((role: Role) => (
                <Pressable
                  key={role}
                  accessibilityRole="radio"
                  accessibilityLabel={`Make ${user.displayName} ${role}`}
                  aria-checked={user.role === role}
                  onPress={() => user.role !== role && changeRole.mutate({ id: user.id, role })}
                  style={[styles.chip, user.role === role && styles.chipOn]}
                >
                  <SkText variant="caption" tone="ink" style={user.role === role && styles.chipTextOn}>
                    {user.role === role ? '✓ ' : ''}
                    {role}
                  </SkText>
                </Pressable>
              ))}
            </View>
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: theme.space(2) },
  card: {
    ...PANEL_BOX_STYLE,
    gap: theme.space(3),
  },
  row: {
    flexDirection: 'row',
    alignItems: 'center',
    paddingVertical: theme.space(3),
    paddingHorizontal: theme.space(3),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
    backgroundColor: theme.color.panel,
  },
  headRow: { backgroundColor: 'transparent' },
  nameCol: { flex: 2 },
  emailCol: { flex: 3 },
  roleCol: { flex: 5 },
  roleCell: { gap: theme.space(2) },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
  chip: {
    ...CHIP_BOX_STYLE,
  },
  chipOn: { backgroundColor: theme.color.accent, borderColor: theme.color.accent },
  chipTextOn: { color: theme.color.accentInk, fontFamily: theme.font.medium },
});
