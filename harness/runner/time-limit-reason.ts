/** Why an evaluation became errors when its target ran past the time limit: the same words whether it was stopped in its thread or its worker was terminated. */
export function timeLimitReason(targetName: string, limitMs: number): string {
  return `${targetName} did not finish within the shard time limit of ${limitMs} ms; the shard was stopped and the target restarted`;
}
