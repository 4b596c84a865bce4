import { useLocalSearchParams } from 'expo-router';
import { ScreenBody } from '../../../../components/ui/screen-body';
import { SuiteFormScreen } from '../../../../components/suites/editor/suite-form-screen';

export default function EditSuiteScreen() {
  const { slug } = useLocalSearchParams<{ slug: string }>();
  return (
    <ScreenBody
      title={`Edit ${slug}`}
      lead="Editing an approved suite starts a new draft version; the approved one stays in use until the new one is approved."
    >
      <SuiteFormScreen slug={slug} />
    </ScreenBody>
  );
}
