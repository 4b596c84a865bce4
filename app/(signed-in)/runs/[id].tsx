import { useLocalSearchParams } from 'expo-router';
import { RunDetail } from '../../../components/runs/run-detail';

/** One run, by id: progress, matrix, property checks and what was checked. */
export default function RunScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return <RunDetail id={String(id)} />;
}
