import { useMe } from '../../client/use-me';
import { OverviewBoard } from '../../components/overview/overview-board';
import { ScreenBody } from '../../components/ui/screen-body';

/** The Overview: what waits on me, what is running, and how each plan's latest run went. */
export default function OverviewScreen() {
  const { data: user } = useMe();
  if (!user) return null;
  return (
    <ScreenBody title="Overview" lead={`Hello, ${user.displayName}.`}>
      <OverviewBoard user={user} />
    </ScreenBody>
  );
}
