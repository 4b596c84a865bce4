/** Asks `probe` every 50 ms until it gives something truthy, and returns that; throws naming `what` after `timeoutMs`. */
export async function until<T>(what: string, probe: () => Promise<T | null | false>, timeoutMs: number): Promise<T> {
  const end = Date.now() + timeoutMs;
  while (Date.now() < end) {
    const got = await probe();
    if (got) return got;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`waited ${timeoutMs} ms for ${what}`);
}
