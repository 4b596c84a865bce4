import type { RunView } from '../../shared/run-view';
import { OUTCOME_TONE } from './outcome-tone';
import { runVerdict } from './run-verdict';
import { TagPill } from '../ui/tag-pill';

/** A run's state as glyph, words and colour together, so it reads without the colour. */
export function RunStatusBadge({ run }: { run: Pick<RunView, 'status' | 'counts'> }) {
  const verdict = runVerdict(run);
  const tone = OUTCOME_TONE[verdict.tone];
  return (
    <TagPill
      text={`${verdict.glyph} ${verdict.word}`}
      ink={tone.ink}
      soft={tone.soft}
      edge={tone.edge}
      accessibilityLabel={`status: ${verdict.word}`}
    />
  );
}
