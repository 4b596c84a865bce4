/** The origin (scheme, host, port) of an http(s) URL, or null for anything else (`null`, file:, garbage). */
export function originOf(url: string): string | null {
  try {
    const parsed = new URL(url);
    return parsed.protocol === 'http:' || parsed.protocol === 'https:' ? parsed.origin : null;
  } catch {
    return null;
  }
}
