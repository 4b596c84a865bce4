import { appendFileSync, existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { PointTable } from './point-table';

/** File header: "SKRC" and the format version. */
const MAGIC = 0x43524b53;
const FORMAT = 1;
const HEADER_BYTES = 8;
/** Per record: kind (u32) and padding, then z.re, z.im, value.re, value.im as float64. */
const RECORD_BYTES = 40;

/** Records of one suite key, packed as [kind, re, im, vre, vim] per record. */
export interface CacheRecords {
  key: string;
  records: Float64Array;
}

/**
 * Reference values by (suite key, kind, exact bits of the point), kept in memory and, with a
 * folder, in one compact binary file per suite key (`<key>.bin`: an 8-byte header, then 40
 * bytes per value). The suite key names the suite id and version and hashes what fixes the
 * values (subject, branch, convention, reference engine), so a suite edited without a version
 * bump gets a fresh file instead of stale values. New values are appended with one write per
 * flush; a torn last record (a crash mid-write) is ignored when the file is read. Only one
 * thread writes (the runner's main thread); workers send what they computed with their results.
 */
export class ReferenceCache {
  private tables = new Map<string, PointTable>();
  private pending = new Map<string, number[]>();
  /** Set when the folder could not be written: later flushes only drop their values. */
  private unwritable = false;
  computed = 0;
  cached = 0;
  /**
   * Expected values already gathered into columns, by the points array they belong to and the
   * suite key: checking the same suite against another target reads the column, not the table.
   */
  readonly columns = new WeakMap<object, Map<string, unknown>>();

  constructor(readonly dir: string | null) {}

  table(key: string): PointTable {
    let t = this.tables.get(key);
    if (t) return t;
    t = new PointTable();
    if (this.dir) {
      const file = path.join(this.dir, `${key}.bin`);
      if (existsSync(file)) readInto(readFileSync(file), t);
    }
    this.tables.set(key, t);
    return t;
  }

  /** Looks a value up, counting a hit. */
  get(key: string, kind: number, re: number, im: number, out: Float64Array | number[], at = 0): boolean {
    const hit = this.table(key).get(kind, re, im, out, at);
    if (hit) this.cached++;
    return hit;
  }

  /** Stores a value just computed, counting it, and queues it for the file. */
  put(key: string, kind: number, re: number, im: number, vre: number, vim: number): void {
    this.computed++;
    this.table(key).set(kind, re, im, vre, vim);
    let list = this.pending.get(key);
    if (!list) this.pending.set(key, (list = []));
    list.push(kind, re, im, vre, vim);
  }

  /** The values computed since the last call, for a worker to send to the main thread. */
  takePending(): CacheRecords[] {
    const out = [...this.pending].map(([key, list]) => ({ key, records: Float64Array.from(list) }));
    this.pending.clear();
    return out;
  }

  /** Takes in values a worker computed (not counted here: the worker counted them). */
  absorb(batches: CacheRecords[]): void {
    for (const { key, records } of batches) {
      const t = this.table(key);
      let list = this.pending.get(key);
      if (!list) this.pending.set(key, (list = []));
      for (let i = 0; i + 4 < records.length; i += 5) {
        t.set(
          records[i] as number,
          records[i + 1] as number,
          records[i + 2] as number,
          records[i + 3] as number,
          records[i + 4] as number,
        );
        list.push(
          records[i] as number,
          records[i + 1] as number,
          records[i + 2] as number,
          records[i + 3] as number,
          records[i + 4] as number,
        );
      }
    }
  }

  /**
   * Appends the queued values to their files (no-op without a folder). A folder that cannot be
   * written (a read-only install of the CLI, a file in its place) costs the run nothing but the
   * saving: one warning says so, and the values stay in memory for the rest of the run.
   */
  flush(): void {
    if (!this.dir || this.unwritable) {
      this.pending.clear();
      return;
    }
    try {
      this.write(this.dir);
    } catch (e) {
      this.unwritable = true;
      process.emitWarning(
        `the reference cache folder ${this.dir} cannot be written (${e instanceof Error ? e.message : String(e)}); this run keeps its reference values in memory only`,
      );
    }
    this.pending.clear();
  }

  private write(dir: string): void {
    mkdirSync(dir, { recursive: true });
    for (const [key, list] of this.pending) {
      if (list.length === 0) continue;
      const file = path.join(dir, `${key}.bin`);
      const fresh = !existsSync(file);
      const body = encode(list);
      if (fresh) {
        // Written whole under a temporary name, then renamed: a reader never sees a half header.
        const tmp = `${file}.${process.pid}.tmp`;
        writeFileSync(tmp, Buffer.concat([header(), body]));
        renameSync(tmp, file);
      } else {
        appendFileSync(file, body);
      }
    }
  }
}

function header(): Buffer {
  const b = Buffer.alloc(HEADER_BYTES);
  b.writeUInt32LE(MAGIC, 0);
  b.writeUInt32LE(FORMAT, 4);
  return b;
}

function encode(list: number[]): Buffer {
  const count = list.length / 5;
  const b = Buffer.alloc(count * RECORD_BYTES);
  for (let r = 0; r < count; r++) {
    const o = r * RECORD_BYTES;
    b.writeUInt32LE(list[5 * r] as number, o);
    b.writeDoubleLE(list[5 * r + 1] as number, o + 8);
    b.writeDoubleLE(list[5 * r + 2] as number, o + 16);
    b.writeDoubleLE(list[5 * r + 3] as number, o + 24);
    b.writeDoubleLE(list[5 * r + 4] as number, o + 32);
  }
  return b;
}

function readInto(buf: Buffer, table: PointTable): void {
  if (buf.length < HEADER_BYTES || buf.readUInt32LE(0) !== MAGIC || buf.readUInt32LE(4) !== FORMAT) return;
  const count = Math.floor((buf.length - HEADER_BYTES) / RECORD_BYTES);
  for (let r = 0; r < count; r++) {
    const o = HEADER_BYTES + r * RECORD_BYTES;
    table.set(
      buf.readUInt32LE(o),
      buf.readDoubleLE(o + 8),
      buf.readDoubleLE(o + 16),
      buf.readDoubleLE(o + 24),
      buf.readDoubleLE(o + 32),
    );
  }
}
