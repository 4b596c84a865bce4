import { ScreenBody } from '../../../components/ui/screen-body';
import { SuiteFormScreen } from '../../../components/suites/editor/suite-form-screen';

export default function NewSuiteScreen() {
  return (
    <ScreenBody
      title="New suite"
      lead="Every rule shows beside its field as you type; the picture shows what the runner will sample. Saving keeps a draft until you submit it for review."
    >
      <SuiteFormScreen slug={null} />
    </ScreenBody>
  );
}
