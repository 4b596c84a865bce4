import { useLiveWorkers } from '../../client/use-live-workers';
import { SkText } from '../ui/sk-text';
import { describeLiveWorkers } from './describe-live-workers';

/** Which workers are taking shards now, under a live run's header (nothing while they load or if the list fails). */
export function LiveWorkersNote() {
  const workers = useLiveWorkers();
  if (!workers.data) return null;
  return (
    <SkText variant="caption" testID="live-workers">
      {describeLiveWorkers(workers.data)}
    </SkText>
  );
}
