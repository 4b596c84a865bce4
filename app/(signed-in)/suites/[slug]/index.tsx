import { useLocalSearchParams } from 'expo-router';
import { useSuite } from '../../../../client/use-suite';
import { PageTitle } from '../../../../components/ui/page-title';
import { ScreenBody } from '../../../../components/ui/screen-body';
import { SuiteDetail } from '../../../../components/suites/suite-detail';

export default function SuiteScreen() {
  const { slug } = useLocalSearchParams<{ slug: string }>();
  const suite = useSuite(slug);
  return (
    <ScreenBody title={suite.data?.[0]?.body.title ?? 'Suite'}>
      <PageTitle title={`Suite ${suite.data?.[0]?.body.title ?? slug}`} />
      <SuiteDetail slug={slug} />
    </ScreenBody>
  );
}
