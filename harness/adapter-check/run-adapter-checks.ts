import fc from 'fast-check';
import { z } from 'zod';
import type { ProgramTargetSource } from '../../shared/target-source';
import { OP_ARITY } from '../adapters/op-arity';
import { formatDouble } from '../reference/numbers/format-double';
import { parseDouble } from '../reference/numbers/parse-double';
import type { AdapterCheckReport } from './adapter-check-report';
import type { AdapterCheckResult } from './adapter-check-result';
import { ADAPTER_CHECKS } from './adapter-checks';
import { answerReading as read } from './answer-reading';
import type { Exchange } from './exchange';
import { ProgramChannel } from './program-channel';
import { ROUND_TRIP_VALUES } from './round-trip-values';

type CheckName = keyof typeof ADAPTER_CHECKS;

/** The seed of the 1,000 items of `batch-of-1000`, printed with any disagreement so it can be replayed. */
const BATCH_SEED = 20261205;
const BIG_BATCH = 1000;
/** Operations of the protocol itself (docs/stdio-protocol.md): answered, and harmless in `ops` (the harness asks only catalogue ones). */
const PROTOCOL_OPS = ['describe', 'entry-points', 'echo'];
/** Names no program should know, so the answers to them test the refusal path. */
const NO_SUCH_OP = 'sheetkeeper-no-such-op';
const NO_SUCH_ENTRY = 'sheetkeeper-no-such-entry';
/**
 * How long to wait after an answer for lines nobody asked for, on the first requests of each kind
 * (not on the 1,000 single calls: it would add 10 s). A stray log line written right after its
 * answer came at most 0.04 ms later (50 requests, load average 8); 10 ms is 250 times that, and costs 0.1 s a run.
 */
const SETTLE_MS = 10;

/** The catalogue functions tried for the batch checks, most common first; `neg` last (it is arithmetic, not a library function). */
const BATCH_OPS = ['sqrt', 'exp', 'log', 'asin', 'acos', 'atan', 'asinh', 'acosh', 'atanh', 'cbrt', 'neg'];

/** Eight distinct items, so a result in the wrong slot differs from the one expected there. */
const ORDER_ITEMS: [string, string][] = [
  ['0.25', '0.5'],
  ['1', '-2'],
  ['-3', '0.75'],
  ['4', '4'],
  ['-0.5', '-6'],
  ['7', '0.125'],
  ['0.0625', '8'],
  ['-9', '-1'],
];

/** An entry as `describe` lists it (shared/target-entry.ts). */
const describedEntry = z.object({
  name: z.string().min(1),
  call: z.string(),
  default: z.boolean(),
  carries: z.object({ imaginaryPart: z.boolean(), realZeroSign: z.boolean(), imaginaryZeroSign: z.boolean() }),
});

const count = (n: number): string => n.toLocaleString('en');
const plural = (n: number, word: string): string => `${count(n)} ${word}${n === 1 ? '' : 's'}`;

/**
 * Runs every check of adapter-checks.ts on the stdio program `source` (docs/adapter-check.md) and
 * reports each as passed, failed (with what the program did and how to fix it) or not checked. One
 * program serves all the checks; one that hangs is killed and a fresh one takes the next request,
 * so one fault does not hide the others. `baseDir` is the folder a relative `cwd` is read from.
 */
export async function runAdapterChecks(source: ProgramTargetSource, baseDir: string): Promise<AdapterCheckReport> {
  const channel = new ProgramChannel(source, baseDir);
  const results = new Map<CheckName, AdapterCheckResult>();
  const pass = (name: CheckName, found: string): void => void results.set(name, { name, status: 'pass', found });
  const fail = (name: CheckName, found: string): void =>
    void results.set(name, { name, status: 'fail', found, advice: ADAPTER_CHECKS[name].advice });
  const skip = (name: CheckName, found: string): void => void results.set(name, { name, status: 'not-checked', found });
  const failure = (e: Exchange): string | null => read.failure(e, channel.stderrTail());
  let library: string | null = null;
  let version: string | null = null;

  /** After a request that must not stop the program: null when the same program answers `describe`. */
  const stillRunning = async (pid: number | null): Promise<string | null> => {
    const next = await channel.ask({ op: 'describe', args: [] }, SETTLE_MS);
    const failed = failure(next);
    if (failed) return `then ${failed}`;
    return channel.processId() === pid ? null : 'then the program exited (a fresh one answered the next request)';
  };

  try {
    const hello = await channel.ask({ op: 'describe', args: [] }, SETTLE_MS);
    const notStarted = failure(hello);
    if (notStarted) {
      fail('starts', notStarted);
      for (const name of Object.keys(ADAPTER_CHECKS) as CheckName[])
        if (name !== 'starts') skip(name, 'the program did not answer `describe`');
      return report();
    }
    pass('starts', `answered describe in ${Math.round(hello.ms)} ms`);
    const described = read.message(hello)!;
    const ops = Array.isArray(described.ops) ? described.ops.filter((x): x is string => typeof x === 'string') : [];
    checkDescribe(described, ops);

    await checkRefusal('not-json', { raw: 'this line is not JSON {' }, null);
    await checkRefusal('unknown-op', { op: NO_SUCH_OP, args: [] }, 'op');

    const batchOp = BATCH_OPS.find((op) => ops.includes(op) && OP_ARITY[op] === 1);
    if (batchOp === undefined) {
      const why = 'describe lists no one-argument catalogue operation to send batches of';
      for (const name of ['unknown-entry', 'batch-order', 'error-in-its-slot', 'batch-of-1000'] as const)
        skip(name, why);
    } else {
      await checkRefusal('unknown-entry', { op: batchOp, args: [['1', '0']], entry: NO_SUCH_ENTRY }, 'entry');
      const singles = await checkBatchOrder(batchOp);
      if (singles) await checkErrorSlot(batchOp, singles);
      else skip('error-in-its-slot', `the program did not answer single ${batchOp} calls`);
    }
    await checkRoundTrip(ops);
    if (batchOp !== undefined) await checkBigBatch(batchOp);

    await channel.settle(SETTLE_MS);
    checkIds();
    checkOneLine();
    checkTimeouts();
    const exitMs = await channel.closeStdin();
    if (exitMs === null) fail('exits-on-stdin-close', 'the program was still running 1 s after its stdin closed');
    else pass('exits-on-stdin-close', `exited ${Math.round(exitMs)} ms after its stdin closed`);
    return report();
  } finally {
    channel.kill();
  }

  function report(): AdapterCheckReport {
    const checks = (Object.keys(ADAPTER_CHECKS) as CheckName[]).map((name) => results.get(name)!);
    return {
      program: source.command.join(' '),
      library,
      version,
      timeLimitMs: channel.timeLimitMs,
      checks,
      passed: checks.filter((c) => c.status === 'pass').length,
      failed: checks.filter((c) => c.status === 'fail').length,
      notChecked: checks.filter((c) => c.status === 'not-checked').length,
    };
  }

  function checkDescribe(answer: Record<string, unknown>, ops: string[]): void {
    const problems: string[] = [];
    const named = (key: 'library' | 'version'): string | null =>
      typeof answer[key] === 'string' && answer[key].trim() !== '' ? answer[key] : null;
    library = named('library');
    version = named('version');
    if (library === null) problems.push('no "library" string');
    if (version === null) problems.push('no "version" string');
    if (!Array.isArray(answer.ops)) problems.push('no "ops" list');
    else if (ops.length !== answer.ops.length) problems.push('"ops" holds something other than strings');
    const unknown = ops.filter((op) => !(op in OP_ARITY) && !PROTOCOL_OPS.includes(op));
    if (unknown.length > 0) problems.push(`ops outside the catalogue: ${unknown.join(', ')}`);
    let entries = '';
    if (answer.entries !== undefined) {
      const parsed = z.array(describedEntry).min(1).safeParse(answer.entries);
      if (!parsed.success) {
        const issue = parsed.error.issues[0]!;
        problems.push(`"entries" ${issue.path.length ? `at ${issue.path.join('.')} ` : ''}${issue.message}`);
      } else {
        const names = parsed.data.map((e) => e.name);
        const defaults = parsed.data.filter((e) => e.default).length;
        if (defaults !== 1) problems.push(`${defaults} entries marked default (one must be)`);
        if (new Set(names).size !== names.length) problems.push('two entries share a name');
        entries = `, entries ${names.join(', ')}`;
      }
    }
    if (problems.length > 0) fail('describe', `describe answered ${problems.join('; ')}`);
    else pass('describe', `${library} ${version}: ${plural(ops.length, 'operation')}${entries}`);
  }

  /** A request the program must refuse with an error line and then keep running. */
  async function checkRefusal(
    name: 'not-json' | 'unknown-op' | 'unknown-entry',
    request: { raw: string } | { op: string; args: unknown[]; entry?: string },
    what: 'op' | 'entry' | null,
  ): Promise<void> {
    const e = await channel.ask(request, SETTLE_MS);
    // The program that answered (a fresh one, when a timeout killed the last).
    const pid = channel.processId();
    const asked =
      what === null
        ? 'a line that is not JSON'
        : what === 'op'
          ? `the unknown op "${NO_SUCH_OP}"`
          : `entry "${NO_SUCH_ENTRY}"`;
    const failed = failure(e);
    if (failed) return fail(name, `sent ${asked}: ${failed}`);
    const m = read.message(e)!;
    if (typeof m.error !== 'string')
      return fail(
        name,
        Array.isArray(m.results)
          ? `answered ${asked} with results instead of {"error"}`
          : `answered ${asked} without an "error" string: ${e.outcome.kind === 'answer' ? e.outcome.line.slice(0, 120) : ''}`,
      );
    if (what === null && m.id !== null)
      return fail(name, `answered a line that is not JSON with id ${JSON.stringify(m.id)} instead of null`);
    const after = await stillRunning(pid);
    if (after) return fail(name, `answered ${asked} with an error, ${after}`);
    pass(name, `answered with an error and kept running: ${JSON.stringify(m.error.slice(0, 80))}`);
  }

  /** Items of `op` sent one at a time, then as one batch. Returns the single answers when each was a result. */
  async function checkBatchOrder(op: string): Promise<ReturnType<typeof read.slot>[] | null> {
    const singles: ReturnType<typeof read.slot>[] = [];
    for (const [k, item] of ORDER_ITEMS.entries()) {
      const e = await channel.ask({ op, args: [item] }, k === 0 ? SETTLE_MS : 0);
      const got = read.results(e, 1, channel.stderrTail());
      if (typeof got === 'string') {
        fail('batch-order', `a single ${op} call: ${got}`);
        return null;
      }
      singles.push(read.slot(got[0]));
    }
    const e = await channel.ask({ op, args: ORDER_ITEMS }, SETTLE_MS);
    const got = read.results(e, ORDER_ITEMS.length, channel.stderrTail());
    if (typeof got === 'string') {
      fail('batch-order', `a batch of ${ORDER_ITEMS.length} ${op} calls: ${got}`);
      return singles;
    }
    const slots = got.map(read.slot);
    const wrong = slots.flatMap((slot, i) => (read.sameSlot(slot, singles[i]!) ? [] : [i]));
    if (wrong.length === 0) {
      pass('batch-order', `${ORDER_ITEMS.length} ${op} calls in one batch, each in its slot`);
      return singles;
    }
    const where = wrong.slice(0, 3).map((i) => {
      const j = singles.findIndex((s) => read.sameSlot(slots[i]!, s));
      return j >= 0
        ? `slot ${i} holds the answer to item ${j}`
        : `slot ${i} answered ${read.show(slots[i]!)} where the same call alone answered ${read.show(singles[i]!)}`;
    });
    fail('batch-order', `in a batch of ${ORDER_ITEMS.length} ${op} calls, ${where.join('; ')}`);
    return singles;
  }

  async function checkErrorSlot(op: string, singles: ReturnType<typeof read.slot>[]): Promise<void> {
    const unreadable = ['not a number', '0'];
    const e = await channel.ask({ op, args: [ORDER_ITEMS[0], unreadable, ORDER_ITEMS[2]] }, SETTLE_MS);
    const got = read.results(e, 3, channel.stderrTail());
    const asked = `a batch of 3 ${op} calls whose middle one is ${JSON.stringify(unreadable)}`;
    if (typeof got === 'string') return fail('error-in-its-slot', `${asked}: ${got}`);
    const [first, middle, last] = got.map(read.slot) as [
      ReturnType<typeof read.slot>,
      ...ReturnType<typeof read.slot>[],
    ];
    if (!('error' in middle!))
      return fail('error-in-its-slot', `${asked}: the middle slot answered ${read.show(middle!)} instead of {"error"}`);
    if (!read.sameSlot(first, singles[0]!) || !read.sameSlot(last!, singles[2]!))
      return fail(
        'error-in-its-slot',
        `${asked}: the other slots answered ${read.show(first)} and ${read.show(last!)} where the calls alone answered ${read.show(singles[0]!)} and ${read.show(singles[2]!)}`,
      );
    pass('error-in-its-slot', `the failing call answered ${read.show(middle)} in its slot`);
  }

  async function checkRoundTrip(ops: string[]): Promise<void> {
    const args = ROUND_TRIP_VALUES.map((v) => [...v.pair]);
    const sent = ROUND_TRIP_VALUES.map((v) => v.pair.map(parseDouble) as [number, number]);
    const echo = await channel.ask({ op: 'echo', args }, SETTLE_MS);
    let through = 'echo';
    let expected = sent;
    let e = echo;
    if (failure(echo) === null && read.requestError(echo) !== null) {
      if (!ops.includes('neg'))
        return skip(
          'number-round-trip',
          `the program has no echo (it answered ${JSON.stringify(read.requestError(echo)!.slice(0, 80))}) and describe lists no neg`,
        );
      // −(a + bi) = −a − bi exactly, −0 and nan included, so neg shows the round trip as well.
      through = 'neg';
      expected = sent.map(([re, im]) => [-re, -im]);
      e = await channel.ask({ op: 'neg', args }, SETTLE_MS);
    }
    const got = read.results(e, args.length, channel.stderrTail());
    if (typeof got === 'string') return fail('number-round-trip', `${through}: ${got}`);
    const lost = got.flatMap((item, i) => {
      const slot = read.slot(item);
      if ('pair' in slot && read.samePair(slot.pair, expected[i]!)) return [];
      const value = ROUND_TRIP_VALUES[i]!;
      const want = JSON.stringify(expected[i]!.map(formatDouble));
      return [`${value.what}: sent ${JSON.stringify(value.pair)}, expected ${want}, got ${read.show(slot)}`];
    });
    if (lost.length === 0)
      return pass('number-round-trip', `${plural(args.length, 'pair')} through ${through}, every bit kept`);
    fail('number-round-trip', `through ${through}, ${lost.length} of ${args.length} pairs changed: ${lost.join('; ')}`);
  }

  async function checkBigBatch(op: string): Promise<void> {
    const items = fc
      .sample(fc.tuple(fc.double(), fc.double()), { seed: BATCH_SEED, numRuns: BIG_BATCH })
      .map((pair) => pair.map(formatDouble));
    const began = performance.now();
    const singles: ReturnType<typeof read.slot>[] = [];
    for (const item of items) {
      const got = read.results(await channel.ask({ op, args: [item] }), 1, channel.stderrTail());
      if (typeof got === 'string') return fail('batch-of-1000', `a single ${op} call (seed ${BATCH_SEED}): ${got}`);
      singles.push(read.slot(got[0]));
    }
    const aloneMs = performance.now() - began;
    const e = await channel.ask({ op, args: items });
    const got = read.results(e, items.length, channel.stderrTail());
    if (typeof got === 'string') return fail('batch-of-1000', `a batch of ${count(BIG_BATCH)} ${op} calls: ${got}`);
    const slots = got.map(read.slot);
    const differ = slots.flatMap((slot, i) => (read.sameSlot(slot, singles[i]!) ? [] : [i]));
    if (differ.length === 0)
      return pass(
        'batch-of-1000',
        `${plural(BIG_BATCH, `${op} call`)} agree bit for bit: ${Math.round(e.ms)} ms as one batch, ${Math.round(aloneMs)} ms one at a time (seed ${BATCH_SEED})`,
      );
    const i = differ[0]!;
    fail(
      'batch-of-1000',
      `${count(differ.length)} of ${count(BIG_BATCH)} slots differ from the same call sent alone (seed ${BATCH_SEED}); first, slot ${i} (${op} of ${JSON.stringify(items[i])}): ${read.show(slots[i]!)} in the batch, ${read.show(singles[i]!)} alone`,
    );
  }

  function checkIds(): void {
    const wrong = channel.exchanges.flatMap((e) => {
      const m = read.message(e);
      return m && m.id !== e.id ? [{ e, got: m.id }] : [];
    });
    if (wrong.length === 0)
      return pass('ids-echoed', `${plural(channel.exchanges.length, 'answer')}, each with its request's id`);
    const { e, got } = wrong[0]!;
    fail(
      'ids-echoed',
      `answered id ${JSON.stringify(got)} while ${JSON.stringify(e.id)} was pending${e.op ? ` (${e.op})` : ''}; ${count(wrong.length)} of ${count(channel.exchanges.length)} answers carried another id`,
    );
  }

  function checkOneLine(): void {
    if (channel.strays.length === 0)
      return pass('one-line-per-request', `${plural(channel.exchanges.length, 'request')}, one line each`);
    const { after, lines } = channel.strays[0]!;
    const answered =
      after === null ? 'before the first request' : `in answer to id ${after.id} (${after.op ?? 'a raw line'})`;
    fail(
      'one-line-per-request',
      `wrote ${lines.length + 1} lines ${answered}; the extra one: ${JSON.stringify(lines[0]!.slice(0, 120))}`,
    );
  }

  function checkTimeouts(): void {
    if (channel.timeouts.length === 0) {
      const slowest = Math.max(...channel.exchanges.map((e) => e.ms));
      return pass('answers-in-time', `slowest answer ${Math.round(slowest)} ms (limit ${channel.timeLimitMs} ms)`);
    }
    const described = channel.timeouts.map(({ exchange: e, next }) => {
      const what = `no answer to id ${e.id} (${e.op ?? 'a raw line'}, ${plural(e.items, 'item')}) within ${e.limitMs} ms; adapter-check killed the program`;
      if (!next) return `${what}; no later request was sent`;
      const failed = failure(next);
      return failed
        ? `${what}, and the fresh one did not answer the next request either: ${failed}`
        : `${what} and a fresh one answered the next request (id ${next.id}, ${next.op ?? 'a raw line'})`;
    });
    fail('answers-in-time', described.join('; '));
  }
}
