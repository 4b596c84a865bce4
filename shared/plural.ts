/**
 * "1 check", "2 checks", "1,073 failures": a count with its word, grouped by thousands in the
 * app's English (en-GB). `many` for words whose plural is not `one` + "s".
 */
export function plural(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString('en-GB')} ${n === 1 ? one : many}`;
}
