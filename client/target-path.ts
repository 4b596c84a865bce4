/**
 * The API path of one target or library: names such as "mathjs@15.2.0/complex" carry a slash,
 * so the name travels percent-encoded in one path segment.
 */
export function targetPath(name: string, what: 'fingerprint' | 'cut-map' | 'version-matrix'): string {
  return `/targets/${encodeURIComponent(name)}/${what}`;
}
