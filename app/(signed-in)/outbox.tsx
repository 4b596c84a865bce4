import { useMe } from '../../client/use-me';
import { MailList } from '../../components/mail/mail-list';
import { MailQueue } from '../../components/mail/mail-queue';
import { QueryState } from '../../components/ui/query-state';
import { ScreenBody } from '../../components/ui/screen-body';

export default function OutboxScreen() {
  const { data: me } = useMe();
  if (!me) return null;
  return (
    <ScreenBody
      title="Outbox"
      lead="Mail Sheetkeeper has not delivered yet, then every message the local mail server received from Sheetkeeper. Nothing here left this machine."
    >
      {me.role === 'admin' ? (
        <>
          <MailQueue />
          <MailList />
        </>
      ) : (
        <QueryState state="error" message="Only admins can see the outbox." />
      )}
    </ScreenBody>
  );
}
