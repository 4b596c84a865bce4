import type { RunView } from '../../shared/run-view';
import { OUTCOME_TONE } from './outcome-tone';
import { runVerdict } from './run-verdict';
import type { CellTally } from './tally-cells';
import { TagPill } from '../ui/tag-pill';

/** A run's state as glyph, words and colour together, so it reads without the colour; `checks` as runVerdict takes them. */
export function RunStatusBadge({
  run,
  checks,
}: {
  run: Pick<RunView, 'status' | 'counts'>;
  checks?: Pick<CellTally, 'error'>;
}) {
  const verdict = runVerdict(run, checks);
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
