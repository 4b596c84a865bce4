/**
 * What the run page says of pairs that wait because no live worker has their target:
 * "Waiting for a worker that has complex.js@2.5.0; none is running." Shared by the run's header
 * and each waiting cell of its matrix, so both say it in the same words.
 */
export function waitingForWorkerWords(targets: readonly string[]): string {
  const names =
    targets.length <= 1 ? (targets[0] ?? '') : `${targets.slice(0, -1).join(', ')} or ${targets[targets.length - 1]}`;
  return `Waiting for a worker that has ${names}; none is running. These checks start once such a worker starts (npm run worker on a machine that has ${targets.length === 1 ? 'it' : 'them'}).`;
}
