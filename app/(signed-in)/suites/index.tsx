import { ScreenBody } from '../../../components/screen-body';
import { SuitesList } from '../../../components/suites-list';

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
