import { useLocalSearchParams } from 'expo-router';
import { CaseDetail } from '../../../components/failures/case-detail';
import { ScreenBody } from '../../../components/ui/screen-body';

export default function FailureCaseScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <ScreenBody title={`Failure #${id}`}>
      <CaseDetail id={String(id)} />
    </ScreenBody>
  );
}
