import { spawn, type ChildProcessWithoutNullStreams } from 'node:child_process';
import { createInterface } from 'node:readline';
import { formatDouble } from '../reference/numbers/format-double';
import { parseDouble } from '../reference/numbers/parse-double';
import type { CallResult } from './call-result';
import type { ComplexPair } from './complex-pair';
import { findEntry } from './find-entry';
import { OP_ARITY } from './op-arity';
import { STDIO_MAX_LINE_BYTES } from './stdio-max-line-bytes';
import { STDIO_TIME_LIMITS } from './stdio-time-limits';
import type { Target } from './target';
import type { TargetIdentity } from '../../shared/target-identity';
import type { ProgramTargetSource } from '../../shared/target-source';

/** A reply line from the program, parsed, or why the batch failed. */
type Reply = { reply: Record<string, unknown> } | { error: string };

const STDERR_TAIL = 2048;

export interface StdioTargetOptions extends TargetIdentity {
  command: string;
  args: string[];
  cwd?: string;
  timeLimitMs?: number;
}

/** A stdio target, with the raw request for operations beyond the catalogue (`entry-points`). */
export interface StdioTarget extends Target {
  /** `entry` names the way the program builds the arguments (docs/stdio-protocol.md); absent, its default. */
  request(op: string, args: unknown[], entry?: string): Promise<Reply>;
  /** The running program's pid, or null when none runs (not started yet, or ended). */
  processId(): number | null;
  /**
   * How the program is started, as a program target source, so adapter-check can start it itself.
   * A promise, as a target may first have to build its program (the C adapter compiles on first use);
   * rejects when it cannot.
   */
  program(): Promise<ProgramTargetSource>;
}

const wirePair = ([re, im]: ComplexPair): [string, string] => [formatDouble(re), formatDouble(im)];

function readPair(item: unknown): CallResult {
  if (Array.isArray(item) && item.length === 2 && typeof item[0] === 'string' && typeof item[1] === 'string') {
    try {
      return { value: [parseDouble(item[0]), parseDouble(item[1])] };
    } catch (e) {
      return { error: `program answered an unreadable number: ${e instanceof Error ? e.message : String(e)}` };
    }
  }
  if (typeof item === 'object' && item !== null && typeof (item as { error?: unknown }).error === 'string') {
    return { error: (item as { error: string }).error };
  }
  return { error: `program answered neither a pair of strings nor an error: ${JSON.stringify(item)}` };
}

/**
 * A library behind the stdio JSON-lines protocol (docs/stdio-protocol.md): one long-lived
 * program per target, started on first use, one request in flight at a time. A
 * request that gets no answer within the time limit, a program that exits, or a line
 * that is not the answer to the pending request turns the batch into error results
 * and kills the program; the next batch starts a fresh one.
 */
export function stdioTarget(options: StdioTargetOptions): StdioTarget {
  const timeLimitMs = options.timeLimitMs ?? STDIO_TIME_LIMITS.requestMs;
  let child: ChildProcessWithoutNullStreams | null = null;
  let pending: { onLine(line: string): void; onExit(what: string): void } | null = null;
  let stderrTail = '';
  let nextId = 1;
  let queue: Promise<unknown> = Promise.resolve();
  let ops: Set<string> | null = null;

  const start = (): ChildProcessWithoutNullStreams => {
    if (child) return child;
    const proc = spawn(options.command, options.args, { cwd: options.cwd, stdio: ['pipe', 'pipe', 'pipe'] });
    child = proc;
    stderrTail = '';
    createInterface({ input: proc.stdout, crlfDelay: Infinity }).on('line', (line) => {
      if (child === proc && line.trim() !== '') pending?.onLine(line);
    });
    proc.stderr.on('data', (chunk: Buffer) => {
      stderrTail = (stderrTail + chunk.toString('utf8')).slice(-STDERR_TAIL);
    });
    // A write to a program that has just died fails with EPIPE; the exit handler reports it.
    proc.stdin.on('error', () => undefined);
    const ended = (what: string): void => {
      if (child !== proc) return;
      child = null;
      pending?.onExit(what);
    };
    // A line without end would grow in memory until the time limit: a program that writes more than
    // STDIO_MAX_LINE_BYTES without a newline is stopped at once and its batch fails, saying so.
    let unended = 0;
    proc.stdout.on('data', (chunk: Buffer) => {
      const newline = chunk.lastIndexOf(10);
      unended = newline < 0 ? unended + chunk.length : chunk.length - newline - 1;
      if (unended > STDIO_MAX_LINE_BYTES && child === proc) {
        ended(`program wrote more than ${STDIO_MAX_LINE_BYTES / 1024 / 1024} MB without ending the line`);
        proc.kill('SIGKILL');
      }
    });
    proc.on('exit', (code, signal) => ended(`program exited with ${signal ? `signal ${signal}` : `code ${code}`}`));
    proc.on('error', (e) => ended(`program could not run: ${e.message}`));
    return proc;
  };

  const kill = (proc: ChildProcessWithoutNullStreams): void => {
    if (child === proc) child = null;
    proc.kill('SIGKILL');
  };

  const send = (op: string, args: unknown[], entry?: string): Promise<Reply> =>
    new Promise<Reply>((resolve) => {
      // A fresh program first has to start: that time is not the library's.
      const limit = child ? timeLimitMs : timeLimitMs + STDIO_TIME_LIMITS.startupAllowanceMs;
      const proc = start();
      const id = nextId++;
      let settled = false;
      const finish = (result: Reply, killProgram: boolean): void => {
        if (settled) return;
        settled = true;
        clearTimeout(timer);
        pending = null;
        if (killProgram) kill(proc);
        resolve(result);
      };
      const withStderr = (text: string): string => (stderrTail.trim() ? `${text}; stderr: ${stderrTail.trim()}` : text);
      const timer = setTimeout(() => finish({ error: withStderr(`no answer within ${limit} ms`) }, true), limit);
      pending = {
        onLine: (line) => {
          let message: unknown;
          try {
            message = JSON.parse(line);
          } catch {
            finish({ error: withStderr(`program wrote a line that is not JSON: ${line.slice(0, 200)}`) }, true);
            return;
          }
          const got = (message as { id?: unknown } | null)?.id;
          if (typeof message !== 'object' || message === null || got !== id) {
            finish({ error: withStderr(`program answered id ${JSON.stringify(got)} while ${id} was pending`) }, true);
            return;
          }
          finish({ reply: message as Record<string, unknown> }, false);
        },
        onExit: (what) => finish({ error: withStderr(what) }, false),
      };
      proc.stdin.write(JSON.stringify(entry === undefined ? { id, op, args } : { id, op, args, entry }) + '\n');
    });

  // One request at a time, in the order asked.
  const request = (op: string, args: unknown[], entry?: string): Promise<Reply> => {
    const next = queue.then(() => send(op, args, entry));
    queue = next.catch(() => undefined);
    return next;
  };

  const describe = async (): Promise<Set<string> | string> => {
    if (ops) return ops;
    const answer = await request('describe', []);
    if ('error' in answer) return answer.error;
    if ('error' in answer.reply) return `describe: ${String(answer.reply.error)}`;
    const listed = answer.reply.ops;
    if (!Array.isArray(listed)) return 'describe: the answer has no ops list';
    ops = new Set(listed.filter((x): x is string => typeof x === 'string'));
    return ops;
  };

  return {
    name: options.name,
    library: options.library,
    version: options.version,
    settings: options.settings,
    ...(options.entries ? { entries: options.entries } : {}),
    ...(options.convention ? { convention: options.convention } : {}),
    request,
    processId: () => child?.pid ?? null,
    program: async () => ({
      kind: 'program',
      command: [options.command, ...options.args],
      ...(options.cwd === undefined ? {} : { cwd: options.cwd }),
      ...(options.timeLimitMs === undefined ? {} : { timeLimitMs: options.timeLimitMs }),
    }),
    supports: async (op) => {
      const known = await describe();
      return typeof known !== 'string' && known.has(op) && op in OP_ARITY;
    },
    evaluate: async (op, calls, entry) => {
      const known = await describe();
      if (typeof known === 'string') return calls.map(() => ({ error: known }));
      // An entry the target declares no such thing as is refused here, naming its entries; one it
      // declares goes with the request (the default is sent as no entry, which older programs read).
      const found = findEntry(options, entry);
      if (found instanceof Error) return calls.map(() => ({ error: found.message }));
      const arity = OP_ARITY[op];
      if (arity === undefined || !known.has(op)) return calls.map(() => ({ error: `${options.library} has no ${op}` }));
      const results: CallResult[] = calls.map((args) =>
        args.length === arity
          ? { error: 'not sent' }
          : { error: `${op} takes ${arity} argument(s), got ${args.length}` },
      );
      const sent = calls.flatMap((args, i) => (args.length === arity ? [i] : []));
      if (sent.length === 0) return results;
      const wire = sent.map((i) => {
        const args = calls[i] as ComplexPair[];
        return arity === 1 ? wirePair(args[0] as ComplexPair) : args.map(wirePair);
      });
      const answer = await request(op, wire, found.default ? undefined : found.name);
      const batchError =
        'error' in answer ? answer.error : 'error' in answer.reply ? `program: ${String(answer.reply.error)}` : null;
      const items = 'reply' in answer ? answer.reply.results : undefined;
      if (batchError === null && (!Array.isArray(items) || items.length !== sent.length)) {
        const count = Array.isArray(items) ? items.length : 'no';
        sent.forEach((i) => (results[i] = { error: `program answered ${count} results for ${sent.length} calls` }));
        if (child) kill(child);
        return results;
      }
      sent.forEach(
        (i, k) => (results[i] = batchError !== null ? { error: batchError } : readPair((items as unknown[])[k])),
      );
      return results;
    },
    close: async () => {
      const proc = child;
      if (!proc) return;
      child = null;
      // A batch still waiting is answered now: its timer would otherwise outlive the target
      // (up to the whole time limit) and keep the process that closed it from exiting.
      pending?.onExit('the target was closed before the program answered');
      if (proc.exitCode !== null || proc.signalCode !== null) return;
      await new Promise<void>((resolve) => {
        const timer = setTimeout(() => proc.kill('SIGKILL'), 1000);
        proc.once('exit', () => {
          clearTimeout(timer);
          resolve();
        });
        proc.stdin.end();
      });
    },
  };
}
