import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import path from 'node:path';
import { createInterface } from 'node:readline';
import type { ProgramTargetSource } from '../../shared/target-source';
import { STDIO_MAX_LINE_BYTES } from '../adapters/stdio-max-line-bytes';
import { STDIO_TIME_LIMITS } from '../adapters/stdio-time-limits';
import type { Exchange } from './exchange';

const STDERR_TAIL = 2048;
/** Stray lines kept per gap between requests; a report quotes only the first. */
const MAX_STRAYS = 100;
/** The harness closes a program's stdin and kills it 1 s later (stdio-target.ts, `close`). */
const EXIT_GRACE_MS = 1000;

/**
 * A stdio program driven line by line, keeping everything it did for the checks to judge: unlike
 * stdio-target.ts, which turns a wrong id or a stray line into an error result, it takes the next
 * line as the answer whatever it says. Ids count from 1 as the harness's do. A request that gets no
 * answer within the time limit (plus the start-up allowance on a fresh program, as the harness
 * gives) kills the program; the next request starts a fresh one.
 */
export class ProgramChannel {
  /** Every request and what came of it, in order. */
  readonly exchanges: Exchange[] = [];
  /** Lines that came when no request was waiting, with the exchange they followed. */
  readonly strays: { after: Exchange | null; lines: string[] }[] = [];
  /** Requests that got no answer in time, each with the first exchange of the fresh program after it. */
  readonly timeouts: { exchange: Exchange; next?: Exchange }[] = [];

  private child: ChildProcessWithoutNullStreams | null = null;
  private queue: string[] = [];
  private waiter: ((line: string | { exited: string }) => void) | null = null;
  private tail = '';
  private nextId = 1;
  private readonly command: string;
  private readonly args: string[];
  private readonly cwd: string;
  readonly timeLimitMs: number;

  constructor(source: ProgramTargetSource, baseDir: string) {
    [this.command, ...this.args] = source.command as [string, ...string[]];
    this.cwd = source.cwd === undefined ? baseDir : path.resolve(baseDir, source.cwd);
    this.timeLimitMs = source.timeLimitMs ?? STDIO_TIME_LIMITS.requestMs;
  }

  /** The running program's pid, or null when none runs. */
  processId(): number | null {
    return this.child?.pid ?? null;
  }

  /** The last 2 KB the program wrote to stderr, trimmed. */
  stderrTail(): string {
    return this.tail.trim();
  }

  private start(): ChildProcessWithoutNullStreams {
    if (this.child) return this.child;
    const proc = spawn(this.command, this.args, { cwd: this.cwd, stdio: ['pipe', 'pipe', 'pipe'] });
    this.child = proc;
    this.queue = [];
    this.tail = '';
    const ended = (what: string): void => {
      if (this.child !== proc) return;
      this.child = null;
      const waiter = this.waiter;
      this.waiter = null;
      waiter?.({ exited: what });
    };
    createInterface({ input: proc.stdout, crlfDelay: Infinity }).on('line', (line) => {
      if (this.child !== proc || line.trim() === '') return;
      const waiter = this.waiter;
      if (waiter) {
        this.waiter = null;
        waiter(line);
      } else if (this.queue.length < MAX_STRAYS) this.queue.push(line);
    });
    let unended = 0;
    proc.stdout.on('data', (chunk: Buffer) => {
      const newline = chunk.lastIndexOf(10);
      unended = newline < 0 ? unended + chunk.length : chunk.length - newline - 1;
      if (unended > STDIO_MAX_LINE_BYTES) {
        ended(`wrote more than ${STDIO_MAX_LINE_BYTES / 1024 / 1024} MB without ending the line`);
        proc.kill('SIGKILL');
      }
    });
    proc.stderr.on('data', (chunk: Buffer) => {
      this.tail = (this.tail + chunk.toString('utf8')).slice(-STDERR_TAIL);
    });
    // A write to a program that has just died fails with EPIPE; the exit handler reports it.
    proc.stdin.on('error', () => undefined);
    proc.on('exit', (code, signal) => ended(`exited with ${signal ? `signal ${signal}` : `code ${code}`}`));
    proc.on('error', (e) => ended(`could not run: ${e.message}`));
    return proc;
  }

  /** Kills the running program, if any; the next request starts a fresh one. */
  kill(): void {
    const proc = this.child;
    this.child = null;
    this.waiter = null;
    proc?.kill('SIGKILL');
  }

  /**
   * Sends one request (an object, given the next id, or a raw line sent as written) and waits for
   * the next line the program writes, the time limit, or its exit; then, given `settleMs`, waits that
   * long for lines nobody asked for. A program may write a stray line with a write of its own after
   * its answer (Python's sys.stdout.write does: one write(2) per call, seen with strace), so it can arrive after
   * the answer; the waits catch it before the next request takes it for its answer.
   */
  async ask(
    request: { op: string; args: unknown[]; entry?: string } | { raw: string },
    settleMs = 0,
  ): Promise<Exchange> {
    // Lets lines already in the pipe be read first, at no measurable cost per request.
    await new Promise((resolve) => setImmediate(resolve));
    const fresh = this.child === null;
    const proc = this.start();
    if (this.queue.length > 0) {
      this.strays.push({ after: this.exchanges.at(-1) ?? null, lines: this.queue });
      this.queue = [];
    }
    const id = 'raw' in request ? null : this.nextId++;
    const line = 'raw' in request ? request.raw : JSON.stringify({ id, ...request });
    const limitMs = fresh ? this.timeLimitMs + STDIO_TIME_LIMITS.startupAllowanceMs : this.timeLimitMs;
    const began = performance.now();
    const got = await new Promise<string | { exited: string } | null>((resolve) => {
      const timer = setTimeout(() => {
        this.waiter = null;
        resolve(null);
      }, limitMs);
      this.waiter = (answer) => {
        clearTimeout(timer);
        resolve(answer);
      };
      proc.stdin.write(line + '\n');
    });
    const exchange: Exchange = {
      id,
      op: 'raw' in request ? null : request.op,
      items: 'raw' in request ? 0 : request.args.length,
      ms: performance.now() - began,
      limitMs,
      outcome:
        got === null
          ? { kind: 'timeout' }
          : typeof got === 'string'
            ? { kind: 'answer', line: got, ...parseLine(got) }
            : { kind: 'exited', what: got.exited },
    };
    const waiting = this.timeouts.at(-1);
    if (waiting && waiting.next === undefined) waiting.next = exchange;
    this.exchanges.push(exchange);
    if (got === null) {
      this.timeouts.push({ exchange });
      this.kill();
    } else if (settleMs > 0) await this.settle(settleMs);
    return exchange;
  }

  /** Waits `ms` for lines nobody asked for (written after the last answer), recording them as strays. */
  async settle(ms: number): Promise<void> {
    await new Promise((resolve) => setTimeout(resolve, ms));
    if (this.queue.length > 0) {
      this.strays.push({ after: this.exchanges.at(-1) ?? null, lines: this.queue });
      this.queue = [];
    }
  }

  /**
   * Closes the program's stdin (starting one first if none runs) and waits up to 1 s for it to exit:
   * the milliseconds it took, or null when it was still running (it is then killed).
   */
  async closeStdin(): Promise<number | null> {
    const proc = this.start();
    this.child = null;
    this.waiter = null;
    if (proc.exitCode !== null || proc.signalCode !== null) return 0;
    const began = performance.now();
    const exited = await new Promise<boolean>((resolve) => {
      const timer = setTimeout(() => resolve(false), EXIT_GRACE_MS);
      proc.once('exit', () => {
        clearTimeout(timer);
        resolve(true);
      });
      proc.stdin.end();
    });
    if (!exited) proc.kill('SIGKILL');
    return exited ? performance.now() - began : null;
  }
}

/** The answer line as JSON, or why it is not. */
function parseLine(line: string): { message: unknown } | { notJson: string } {
  try {
    return { message: JSON.parse(line) as unknown };
  } catch (e) {
    return { notJson: e instanceof Error ? e.message : String(e) };
  }
}
