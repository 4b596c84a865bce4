import { useLocalSearchParams } from 'expo-router';
import { ScreenBody } from '../../../components/ui/screen-body';
import { SuiteReview } from '../../../components/review/suite-review';
import { useSuite } from '../../../client/use-suite';

export default function ReviewSuiteScreen() {
  const { slug } = useLocalSearchParams<{ slug: string }>();
  const suite = useSuite(slug);
  return (
    <ScreenBody title={`Review: ${suite.data?.[0]?.body.title ?? slug}`}>
      <SuiteReview slug={slug} />
    </ScreenBody>
  );
}
