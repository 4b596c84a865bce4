/**
 * Why an evaluation became errors when its target ran past the time limit: the same words whether
 * it was stopped in its thread or its worker was terminated, and on the server too, which
 * evaluates each shard as one slice of all its paths.
 */
export function timeLimitReason(targetName: string, limitMs: number): string {
  return `${targetName} did not finish within the time limit of ${limitMs} ms; the evaluation was stopped and the target restarted`;
}
