const scratch = new Float64Array(2);
const words = new Uint32Array(scratch.buffer);
/** Fields per key: kind, then the four 32-bit words of re and im. */
const KEY = 5;

/**
 * A hash table from (kind, exact bits of a complex double) to a complex double, open
 * addressing with linear probing over typed arrays: no strings, no objects per entry. Lookups
 * cost tens of nanoseconds, so a run whose reference values are all cached pays almost
 * nothing for them. ±0 and every NaN payload are distinct keys, as the bits are.
 */
export class PointTable {
  private keys: Uint32Array;
  private values: Float64Array;
  private used: Uint8Array;
  private capacity: number;
  size = 0;

  constructor(initial = 1024) {
    this.capacity = 1 << Math.ceil(Math.log2(Math.max(16, initial * 2)));
    this.keys = new Uint32Array(this.capacity * KEY);
    this.values = new Float64Array(this.capacity * 2);
    this.used = new Uint8Array(this.capacity);
  }

  private slot(kind: number, re: number, im: number): number {
    scratch[0] = re;
    scratch[1] = im;
    const a = words[0] as number;
    const b = words[1] as number;
    const c = words[2] as number;
    const d = words[3] as number;
    let h = Math.imul(kind + 0x9e3779b9, 0x85ebca6b) ^ a;
    h = Math.imul(h ^ (h >>> 15), 0x2c1b3c6d) ^ b;
    h = Math.imul(h ^ (h >>> 13), 0x297a2d39) ^ c;
    h = Math.imul(h ^ (h >>> 16), 0x85ebca6b) ^ d;
    h ^= h >>> 13;
    const mask = this.capacity - 1;
    for (let i = (h >>> 0) & mask; ; i = (i + 1) & mask) {
      if (!this.used[i]) return ~i;
      const k = i * KEY;
      const keys = this.keys;
      if (keys[k] === kind && keys[k + 1] === a && keys[k + 2] === b && keys[k + 3] === c && keys[k + 4] === d)
        return i;
    }
  }

  /** Writes the value into `out` and returns true, or returns false when the key is absent. */
  get(kind: number, re: number, im: number, out: Float64Array | number[], at = 0): boolean {
    const i = this.slot(kind, re, im);
    if (i < 0) return false;
    out[at] = this.values[2 * i] as number;
    out[at + 1] = this.values[2 * i + 1] as number;
    return true;
  }

  set(kind: number, re: number, im: number, vre: number, vim: number): void {
    if ((this.size + 1) * 2 > this.capacity) this.grow();
    let i = this.slot(kind, re, im);
    if (i < 0) {
      i = ~i;
      this.used[i] = 1;
      const k = i * KEY;
      scratch[0] = re;
      scratch[1] = im;
      this.keys[k] = kind;
      this.keys[k + 1] = words[0] as number;
      this.keys[k + 2] = words[1] as number;
      this.keys[k + 3] = words[2] as number;
      this.keys[k + 4] = words[3] as number;
      this.size++;
    }
    this.values[2 * i] = vre;
    this.values[2 * i + 1] = vim;
  }

  private grow(): void {
    const { keys, values, used, capacity } = this;
    this.capacity = capacity * 2;
    this.keys = new Uint32Array(this.capacity * KEY);
    this.values = new Float64Array(this.capacity * 2);
    this.used = new Uint8Array(this.capacity);
    this.size = 0;
    const bits = new Float64Array(2);
    const w = new Uint32Array(bits.buffer);
    for (let i = 0; i < capacity; i++) {
      if (!used[i]) continue;
      const k = i * KEY;
      w[0] = keys[k + 1] as number;
      w[1] = keys[k + 2] as number;
      w[2] = keys[k + 3] as number;
      w[3] = keys[k + 4] as number;
      this.set(
        keys[k] as number,
        bits[0] as number,
        bits[1] as number,
        values[2 * i] as number,
        values[2 * i + 1] as number,
      );
    }
  }
}
