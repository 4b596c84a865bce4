import { useLocalSearchParams } from 'expo-router';
import { OPENED_EXISTING_PARAM } from '../../../client/opened-existing-param';
import { RunDetail } from '../../../components/runs/run-detail';

/** One run, by id: progress, matrix, property checks and what was checked (its tab title comes from RunDetail). */
export default function RunScreen() {
  const params = useLocalSearchParams<{ id: string; [OPENED_EXISTING_PARAM]?: string }>();
  return <RunDetail id={String(params.id)} openedExisting={params[OPENED_EXISTING_PARAM] === '1'} />;
}
