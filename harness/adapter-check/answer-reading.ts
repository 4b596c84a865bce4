import { parseDouble } from '../reference/numbers/parse-double';
import type { Exchange } from './exchange';

/** A result slot as read: a pair of doubles with the strings answered, a per-call error, or something else. */
type Slot = { pair: [number, number]; text: [string, string] } | { error: string } | { bad: string };

/** Same bits, NaN equal to NaN (the protocol does not keep NaN's sign or payload). */
const sameDouble = (a: number, b: number): boolean => Object.is(a, b) || (a !== a && b !== b);

/**
 * Reading a stdio program's answers for adapter-check: what an exchange came to in words, its
 * request-level error, its results, and each result slot, compared bit for bit.
 */
export const answerReading = {
  /** What came of a request that was not answered with a JSON object, in words; null when it was. */
  failure(e: Exchange, stderr: string): string | null {
    const withStderr = (text: string): string => (stderr ? `${text} (stderr: ${stderr.slice(-300)})` : text);
    const what = e.op === null ? 'the line' : `id ${e.id} (${e.op})`;
    if (e.outcome.kind === 'timeout') return `no answer to ${what} within ${e.limitMs} ms`;
    if (e.outcome.kind === 'exited') return withStderr(`the program ${e.outcome.what} instead of answering ${what}`);
    if ('notJson' in e.outcome)
      return `answered ${what} with a line that is not JSON: ${JSON.stringify(e.outcome.line.slice(0, 120))}`;
    const m = e.outcome.message;
    if (typeof m !== 'object' || m === null || Array.isArray(m))
      return `answered ${what} with ${JSON.stringify(m).slice(0, 120)}, not a JSON object`;
    return null;
  },

  /** The answer as an object, when it is one. */
  message(e: Exchange): Record<string, unknown> | null {
    if (e.outcome.kind !== 'answer' || !('message' in e.outcome)) return null;
    const m = e.outcome.message;
    return typeof m === 'object' && m !== null && !Array.isArray(m) ? (m as Record<string, unknown>) : null;
  },

  /** The request-level `error` text, when the answer is {"id", "error"}. */
  requestError(e: Exchange): string | null {
    const m = answerReading.message(e);
    return m && typeof m.error === 'string' ? m.error : null;
  },

  /** The `results` of an answer with `n` of them, or what is wrong with the answer, in words. */
  results(e: Exchange, n: number, stderr: string): unknown[] | string {
    const failed = answerReading.failure(e, stderr);
    if (failed) return failed;
    const m = answerReading.message(e)!;
    if (typeof m.error === 'string') return `refused the whole request: ${JSON.stringify(m.error.slice(0, 200))}`;
    if (!Array.isArray(m.results)) return `answered id ${e.id} (${e.op}) with neither "results" nor "error"`;
    if (m.results.length !== n) return `answered ${m.results.length} results for ${n} calls`;
    return m.results;
  },

  slot(item: unknown): Slot {
    if (Array.isArray(item) && item.length === 2 && typeof item[0] === 'string' && typeof item[1] === 'string') {
      try {
        return { pair: [parseDouble(item[0]), parseDouble(item[1])], text: [item[0], item[1]] };
      } catch {
        return { bad: `unreadable numbers ${JSON.stringify(item)}` };
      }
    }
    if (typeof item === 'object' && item !== null && typeof (item as { error?: unknown }).error === 'string')
      return { error: (item as { error: string }).error };
    return { bad: `neither a pair of strings nor {"error"}: ${JSON.stringify(item)?.slice(0, 120)}` };
  },

  /** True when two slots say the same: equal bits, or both a per-call error. */
  sameSlot(a: Slot, b: Slot): boolean {
    if ('pair' in a && 'pair' in b) return sameDouble(a.pair[0], b.pair[0]) && sameDouble(a.pair[1], b.pair[1]);
    return 'error' in a && 'error' in b;
  },

  /** True when `pair` holds exactly the doubles `expected`. */
  samePair(pair: [number, number], expected: readonly [number, number]): boolean {
    return sameDouble(pair[0], expected[0]) && sameDouble(pair[1], expected[1]);
  },

  /** A slot as the program wrote it, for a message. */
  show(slot: Slot): string {
    if ('pair' in slot) return JSON.stringify(slot.text);
    if ('error' in slot) return `{"error": ${JSON.stringify(slot.error.slice(0, 80))}}`;
    return slot.bad;
  },
};
