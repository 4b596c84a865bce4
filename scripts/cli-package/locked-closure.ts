/** One entry of package-lock.json's `packages` map, as far as the closure reads it. */
interface LockEntry {
  version?: string;
  dependencies?: Record<string, string>;
  optionalDependencies?: Record<string, string>;
  peerDependencies?: Record<string, string>;
  peerDependenciesMeta?: Record<string, { optional?: boolean }>;
}

/**
 * The places in the root's installed tree (package-lock.json's `packages` keys, such as
 * `node_modules/mathjs` or `node_modules/a/node_modules/b`) of every package the named
 * dependencies need at run time: their dependencies, optional ones present in the lock and
 * non-optional peers, each found the way Node finds it (the innermost node_modules first), sorted.
 * Copying these folders to the same places under another folder gives it the root's very versions.
 * Throws naming a needed package the lock does not have.
 */
export function lockedClosure(
  dependencies: readonly string[],
  lock: { packages: Record<string, LockEntry> },
): string[] {
  const found = new Set<string>();
  const resolve = (from: string, name: string): string | null => {
    for (let at = from; ; at = at.slice(0, Math.max(0, at.lastIndexOf('/node_modules/')))) {
      const candidate = `${at ? `${at}/` : ''}node_modules/${name}`;
      if (lock.packages[candidate]) return candidate;
      if (!at) return null;
    }
  };
  const visit = (from: string, names: readonly string[], optional: ReadonlySet<string>) => {
    for (const name of names) {
      const at = resolve(from, name);
      if (at === null) {
        // An optional dependency for another platform is not in the lock; npm skips it too.
        if (optional.has(name)) continue;
        throw new Error(`package-lock.json has no ${name} for ${from || 'the root'}`);
      }
      if (found.has(at)) continue;
      found.add(at);
      const entry = lock.packages[at] as LockEntry;
      const peers = Object.keys(entry.peerDependencies ?? {}).filter((p) => !entry.peerDependenciesMeta?.[p]?.optional);
      const optionals = Object.keys(entry.optionalDependencies ?? {});
      visit(at, [...Object.keys(entry.dependencies ?? {}), ...optionals, ...peers], new Set(optionals));
    }
  };
  visit('', dependencies, new Set());
  return [...found].sort();
}
