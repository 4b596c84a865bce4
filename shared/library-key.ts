/**
 * A target's name without its version, naming one library with one set of settings across its
 * versions, as the version matrix takes it: "mathjs@15.2.0/complex" → "mathjs/complex",
 * "complex.js@2.4.3" → "complex.js" (the rule of harness/matrix/library-versions.ts).
 */
export function libraryKey(targetName: string): string {
  return targetName.replace(/@[^/]*/, '');
}
