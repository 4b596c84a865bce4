import { useLocalSearchParams } from 'expo-router';
import { CaseDetail } from '../../../components/failures/case-detail';
import { PageTitle } from '../../../components/ui/page-title';
import { ScreenBody } from '../../../components/ui/screen-body';

export default function FailureCaseScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  return (
    <ScreenBody title={`Failure #${id}`}>
      <PageTitle title={`Failure #${id}`} />
      <CaseDetail id={String(id)} />
    </ScreenBody>
  );
}
