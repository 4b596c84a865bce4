import { useLocalSearchParams } from 'expo-router';
import { CaseDetail } from '../../../components/case-detail';
import { ScreenBody } from '../../../components/screen-body';

export default function FailureCaseScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <ScreenBody title={`Failure #${id}`}>
      <CaseDetail id={String(id)} />
    </ScreenBody>
  );
}
