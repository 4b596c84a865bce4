/**
 * Every check adapter-check makes, in the order it reports them (docs/adapter-check.md): what it
 * checks and, for a failure, why it matters and how to fix it. What the program actually did is
 * added by the check that saw it (`AdapterCheckResult.found`).
 */
export const ADAPTER_CHECKS = {
  starts: {
    group: 'protocol',
    checks: 'the program starts and answers `describe` with one JSON object',
    advice:
      'the harness sends `describe` first and can use nothing else until it is answered: read stdin line by line and answer {"id", "library", "version", "ops"} on one line, flushed.',
  },
  describe: {
    group: 'protocol',
    checks: '`describe` names the library and version, lists catalogue operations and valid entries',
    advice:
      'the harness names the target from library and version and asks only for listed ops: list catalogue names only (docs/stdio-protocol.md, "Catalogue operations"), and entries as {name, call, default, carries}, exactly one default.',
  },
  'one-line-per-request': {
    group: 'protocol',
    checks: 'every request is answered by exactly one line',
    advice:
      'the harness reads one line per request, so an extra line is taken as the answer to the next request: write each answer as one JSON line and nothing else to stdout (logs go to stderr).',
  },
  'ids-echoed': {
    group: 'protocol',
    checks: "every answer carries its request's id",
    advice:
      'answers must come in request order, one line per request, each with the id it answers; the harness kills a program that answers another id.',
  },
  'unknown-op': {
    group: 'protocol',
    checks: 'an unknown operation is answered {"id", "error"} and the program keeps running',
    advice:
      'a request the program cannot serve must be answered with an error line, not ignored or fatal: catch it, answer {"id": …, "error": "…"} and read the next line.',
  },
  'not-json': {
    group: 'protocol',
    checks: 'a line that is not JSON is answered {"id": null, "error"} and the program keeps running',
    advice:
      'a broken line must not stop the program or go unanswered: catch the parse error, answer {"id": null, "error": "…"} and read the next line.',
  },
  'unknown-entry': {
    group: 'protocol',
    checks: 'a request naming an entry the program does not have is refused with {"id", "error"}',
    advice:
      'values built some other way than the request names would be reported under the wrong entry: refuse an entry you do not list with {"id": …, "error": "no entry …"}.',
  },
  'batch-order': {
    group: 'batching',
    checks: 'a batch of N items answers N results, each in its own slot',
    advice:
      'the harness matches results to calls by position: answer exactly one result per item, in the order of `args`.',
  },
  'batch-of-1000': {
    group: 'batching',
    checks: 'a 1,000-item batch agrees bit for bit with the same items sent one at a time',
    advice:
      'suites send up to thousands of points in one request, so a batch must give what each call gives alone: keep no state between the items of a batch and do not truncate or reorder it.',
  },
  'error-in-its-slot': {
    group: 'errors',
    checks: 'a call that fails answers {"error"} in its own slot; the other results keep theirs',
    advice:
      'one failing call must not lose the batch or shift the other results: catch the failure per call and put {"error": "…"} in that call\'s slot.',
  },
  'number-round-trip': {
    group: 'numbers',
    checks:
      'numbers survive the trip bit for bit: −0 in either part, subnormals, ±inf, nan, hex floats, 17-digit decimals',
    advice:
      'a lost −0 or a misread digit is reported as the library\'s fault: read numbers with a correctly rounded parser that keeps "-0" and takes "inf", "nan" and hex floats, and write the shortest decimal that reads back (Python repr, C "%.17g" or "%a").',
  },
  'answers-in-time': {
    group: 'timeouts',
    checks: 'every request is answered within the time limit',
    advice:
      'the harness kills a program that does not answer in time and fails that batch: answer every request, including ones it cannot serve, and answer batches as fast as the library allows.',
  },
  'exits-on-stdin-close': {
    group: 'exit',
    checks: 'the program exits within 1 s of its stdin closing',
    advice:
      'the harness closes stdin to stop the program and kills it after 1 s: end the read loop at end of input and exit.',
  },
} as const;
