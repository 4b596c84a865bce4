/** One difference between two suite bodies, at a dotted field path. */
export interface SuiteBodyChange {
  field: string;
  change: 'changed' | 'added' | 'removed';
  before: string | null;
  after: string | null;
}

function flatten(value: unknown, prefix: string, out: Map<string, string>): void {
  if (value !== null && typeof value === 'object') {
    const entries = Array.isArray(value) ? value.map((v, i) => [String(i), v] as const) : Object.entries(value);
    if (entries.length === 0) out.set(prefix, Array.isArray(value) ? '[]' : '{}');
    for (const [k, v] of entries) flatten(v, prefix ? `${prefix}.${k}` : k, out);
    return;
  }
  out.set(prefix, typeof value === 'string' ? value : JSON.stringify(value));
}

/**
 * Field-by-field differences between two suite bodies (the version number aside): every leaf
 * value that changed, appeared or disappeared, in the order of the newer body. A list that appears
 * empty is no change: a version stored before a field with an empty default existed lacks it.
 */
export function diffSuiteBodies(before: unknown, after: unknown): SuiteBodyChange[] {
  const a = new Map<string, string>();
  const b = new Map<string, string>();
  flatten(before, '', a);
  flatten(after, '', b);
  const changes: SuiteBodyChange[] = [];
  for (const [field, value] of b) {
    if (field === 'version') continue;
    const old = a.get(field);
    // An empty list where the older body had nothing is a default the schema gained since (counterparts: []), not an edit.
    if (old === undefined && value === '[]') continue;
    if (old === undefined) changes.push({ field, change: 'added', before: null, after: value });
    else if (old !== value) changes.push({ field, change: 'changed', before: old, after: value });
  }
  for (const [field, value] of a)
    if (field !== 'version' && !b.has(field)) changes.push({ field, change: 'removed', before: value, after: null });
  return changes;
}
