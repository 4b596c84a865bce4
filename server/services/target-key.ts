/**
 * A target without its version: "complex.js@2.4.1" → "complex.js", "mathjs@15.2.0/number/predictable"
 * → "mathjs/number/predictable". Runs are compared per key, so an upgrade of a library
 * compares the new version with the old one and reports a version change.
 */
export function targetKey(name: string): string {
  return name.replace(/@[^/]+/, '');
}
