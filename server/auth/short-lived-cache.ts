/**
 * A bounded map whose entries live `ttlMs`. It keeps per-request reads (the session row and
 * the signed-in user) off the database when the same browser asks again within a moment.
 * When full, the oldest entry goes first (a Map iterates in insertion order).
 */
export class ShortLivedCache<V> {
  private readonly entries = new Map<string, { value: V; until: number }>();

  constructor(
    private readonly ttlMs: number,
    private readonly maxEntries = 10_000,
  ) {}

  get(key: string): V | undefined {
    const hit = this.entries.get(key);
    if (!hit) return undefined;
    if (hit.until < Date.now()) {
      this.entries.delete(key);
      return undefined;
    }
    return hit.value;
  }

  set(key: string, value: V): void {
    this.entries.delete(key);
    if (this.entries.size >= this.maxEntries) this.entries.delete(this.entries.keys().next().value!);
    this.entries.set(key, { value, until: Date.now() + this.ttlMs });
  }

  delete(key: string): void {
    this.entries.delete(key);
  }

  clear(): void {
    this.entries.clear();
  }
}
