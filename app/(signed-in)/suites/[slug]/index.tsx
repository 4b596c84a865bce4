import { useLocalSearchParams } from 'expo-router';
import { useSuite } from '../../../../client/use-suite';
import { ScreenBody } from '../../../../components/ui/screen-body';
import { SuiteDetail } from '../../../../components/suites/suite-detail';

export default function SuiteScreen() {
  const { slug } = useLocalSearchParams<{ slug: string }>();
  const suite = useSuite(slug);
  return (
    <ScreenBody
      pageTitle={`Suite ${suite.data?.[0]?.body.title ?? slug}`}
      title={suite.data?.[0]?.body.title ?? 'Suite'}
    >
      <SuiteDetail slug={slug} />
    </ScreenBody>
  );
}
