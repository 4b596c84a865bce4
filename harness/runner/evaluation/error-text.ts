/** The message of whatever was thrown. */
export function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
