/**
 * Keeps computed answers in memory, newest use last, dropping the least recently used beyond
 * `capacity`. A computation still running is shared: two visitors asking for the same thing at
 * once cause one computation. A failed computation is forgotten so the next request tries again.
 */
export class ResultCache<T> {
  private readonly entries = new Map<string, Promise<T>>();

  constructor(private readonly capacity: number) {}

  get(key: string, compute: () => Promise<T>): Promise<T> {
    const known = this.entries.get(key);
    if (known) {
      this.entries.delete(key);
      this.entries.set(key, known);
      return known;
    }
    const pending = compute();
    this.entries.set(key, pending);
    pending.catch(() => {
      if (this.entries.get(key) === pending) this.entries.delete(key);
    });
    while (this.entries.size > this.capacity) this.entries.delete(this.entries.keys().next().value!);
    return pending;
  }

  has(key: string): boolean {
    return this.entries.has(key);
  }

  get size(): number {
    return this.entries.size;
  }
}
