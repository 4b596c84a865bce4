import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { formatDate } from '../../client/format-date';
import { refusalMessage } from '../../client/refusal-message';
import { useChangeRole } from '../../client/use-change-role';
import { useSendPasswordReset } from '../../client/use-send-password-reset';
import { useSetUserActive } from '../../client/use-set-user-active';
import { theme } from '../../constants/theme';
import type { PublicUser } from '../../shared/public-user';
import { roleWithArticle } from '../../shared/role-with-article';
import type { Role } from '../../shared/roles';
import { ActionButton } from '../ui/action-button';
import { ChipGroup } from '../ui/chip-group';
import { ConfirmAction } from '../ui/confirm-action';
import { FailureAlert } from '../ui/failure-alert';
import { PANEL_BOX_STYLE } from '../ui/panel-box-style';
import { SkText } from '../ui/sk-text';
import { ROLE_OPTIONS } from './role-options';
import { USER_COLUMNS } from './user-columns';

const UNREACHABLE = 'The server could not be reached; nothing was changed.';

/**
 * One account in the admin's list: its role (a new one is asked about before it is saved, then
 * "saved" shows beside the row), deactivate or reactivate, and a mailed password reset. Every
 * answer, a refusal included, is shown on the row it is about.
 */
export function UserRow({ user, isMe, wide }: { user: PublicUser; isMe: boolean; wide: boolean }) {
  const [asked, setAsked] = useState<Role | null>(null);
  const changeRole = useChangeRole();
  const setActive = useSetUserActive();
  const reset = useSendPasswordReset();
  const name = user.displayName;
  const deactivated = user.deactivatedAt !== null;
  const lastAction = [changeRole, setActive, reset].reduce((a, b) => (b.submittedAt > a.submittedAt ? b : a));
  const refusal = refusalMessage(lastAction.error, UNREACHABLE);

  return (
    <View style={[wide ? styles.row : styles.card, deactivated && styles.deactivated]} testID={`user-${user.email}`}>
      <View style={wide ? styles.nameCol : undefined}>
        <SkText variant="label">
          {name}
          {isMe ? ' (you)' : ''}
        </SkText>
        <SkText variant="mono" tone="inkSoft">
          {user.email}
        </SkText>
        {deactivated ? (
          <SkText variant="smallLabel" tone="danger" testID={`deactivated-${user.email}`}>
            Deactivated {formatDate(user.deactivatedAt!)}: cannot sign in
          </SkText>
        ) : null}
      </View>
      <View style={[wide ? styles.roleCol : undefined, styles.cell]}>
        <ChipGroup
          label="Role"
          groupLabel={`Role of ${name}`}
          // The ROLE column heading names the chips of every row on a wide screen; a phone's card has no heading.
          labelHidden={wide}
          options={ROLE_OPTIONS}
          value={user.role}
          onChange={(role) => {
            changeRole.reset();
            setAsked(role === user.role ? null : role);
          }}
        />
        {asked ? (
          <View style={styles.ask} accessibilityLiveRegion="polite">
            <SkText variant="label">
              Make {name} {roleWithArticle(asked)}?
            </SkText>
            <View style={styles.buttons}>
              <ActionButton
                label={`Yes, make ${roleWithArticle(asked)}`}
                onPress={() => {
                  changeRole.mutate({ id: user.id, role: asked });
                  setAsked(null);
                }}
              />
              <ActionButton label={`Keep ${roleWithArticle(user.role)}`} tone="quiet" onPress={() => setAsked(null)} />
            </View>
          </View>
        ) : null}
      </View>
      <View style={[wide ? styles.actionCol : undefined, styles.cell]}>
        {isMe ? null : deactivated ? (
          <ActionButton
            label="Reactivate"
            accessibilityLabel={`Reactivate ${name}`}
            tone="quiet"
            busy={setActive.isPending}
            onPress={() => setActive.mutate({ id: user.id, active: true })}
          />
        ) : (
          <>
            <ConfirmAction
              label="Deactivate"
              accessibilityLabel={`Deactivate ${name}`}
              question={`Deactivate ${name}? They are signed out at once, their API tokens stop working, and they cannot sign in until reactivated.`}
              confirmLabel="Yes, deactivate"
              busy={setActive.isPending}
              onConfirm={() => setActive.mutate({ id: user.id, active: false })}
            />
            <ConfirmAction
              label="Mail a password reset"
              accessibilityLabel={`Mail a password reset to ${name}`}
              question={`Mail ${name} a link to choose a new password? Their password works until they use it.`}
              confirmLabel="Yes, mail the link"
              busy={reset.isPending}
              onConfirm={() => reset.mutate(user.id)}
            />
          </>
        )}
      </View>
      <View style={wide ? styles.statusCol : undefined} accessibilityLiveRegion="polite">
        {lastAction.isPending ? (
          <SkText variant="smallLabel" tone="inkSoft">
            Saving…
          </SkText>
        ) : refusal ? (
          <FailureAlert message={refusal} glyph="×" />
        ) : lastAction === changeRole && changeRole.isSuccess ? (
          <SkText variant="smallLabel" tone="accent" testID={`saved-${user.email}`}>
            saved: {roleWithArticle(user.role)}
          </SkText>
        ) : lastAction === setActive && setActive.isSuccess ? (
          <SkText variant="smallLabel" tone="accent">
            saved: {deactivated ? 'deactivated' : 'active again'}
          </SkText>
        ) : lastAction === reset && reset.data ? (
          <SkText variant="smallLabel" tone="accent">
            Reset link mailed to {reset.data.reset.email}; it works until {formatDate(reset.data.reset.expiresAt)}.
          </SkText>
        ) : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  card: { ...PANEL_BOX_STYLE, gap: theme.space(3) },
  row: {
    flexDirection: 'row',
    alignItems: 'flex-start',
    gap: theme.space(3),
    paddingVertical: theme.space(3),
    paddingHorizontal: theme.space(3),
    borderBottomWidth: 1,
    borderBottomColor: theme.color.rule,
    backgroundColor: theme.color.panel,
  },
  deactivated: { backgroundColor: theme.color.paper },
  nameCol: USER_COLUMNS.name,
  roleCol: USER_COLUMNS.role,
  actionCol: USER_COLUMNS.account,
  statusCol: USER_COLUMNS.status,
  cell: { gap: theme.space(2) },
  ask: {
    gap: theme.space(2),
    padding: theme.space(3),
    borderRadius: theme.radius,
    backgroundColor: theme.color.accentSoft,
  },
  buttons: { flexDirection: 'row', flexWrap: 'wrap', gap: theme.space(2) },
});
