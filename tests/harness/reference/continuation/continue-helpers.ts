import { answerContinue } from '../../../../harness/reference/continuation/answer-continue';

type Complex = { re: string; im: string };

/** Runs one `continue` request and returns the answer, throwing if it is an error. */
export function run(request: Record<string, unknown>): { values: { t: string; z: Complex; f: Complex }[]; monodromy: Complex | null } {
  const answer = answerContinue(request);
  if ('error' in answer) throw new Error(String(answer.error));
  return answer as never;
}

export const c = (re: string | number, im: string | number = 0): Complex => ({ re: String(re), im: String(im) });

export function circle(center: Complex, radius: string, turns = 1, direction: 'ccw' | 'cw' = 'ccw', startAngle = '0') {
  return { kind: 'circle', center, radius, turns, direction, start_angle: startAngle };
}

export const num = (s: string) => Number(s);
