/**
 * The target names a worker takes: those it has, narrowed to the ones `patterns` name
 * (SHEETKEEPER_WORKER_TARGETS), each pattern a whole name or the start of names ("complex.js@2.4"
 * takes 2.4.1, 2.4.2 and 2.4.3; "mathjs@15.2.0/" every entry of that version). No patterns: all
 * of them. Order as given, no repeats.
 */
export function narrowTargets(names: readonly string[], patterns: readonly string[] | null): string[] {
  const unique = [...new Set(names)];
  if (patterns === null) return unique;
  return unique.filter((name) => patterns.some((p) => name.startsWith(p)));
}
