import { ScreenBody } from '../../../components/ui/screen-body';
import { SuitesList } from '../../../components/suites/suites-list';

export default function SuitesScreen() {
  return (
    <ScreenBody
      title="Suites"
      lead="Expected branch values along paths around branch points. Plans run each suite's newest approved version."
    >
      <SuitesList />
    </ScreenBody>
  );
}
