/**
 * How long the harness waits for a stdio program (docs/stdio-protocol.md, "Time limit"), used by
 * stdio-target.ts and by adapter-check, which must judge a program by the limits the harness applies.
 */
export const STDIO_TIME_LIMITS = {
  /** Measured: the cmath adapter answers a 1000-point batch in ~15 ms; 10 s leaves room for slow libraries and loaded machines. */
  requestMs: 10_000,
  /**
   * Extra time for the first request to a freshly started program: that time is not the library's.
   * Python with cmath starts in ~40 ms on an idle machine, but took over 400 ms with the load at 7.
   */
  startupAllowanceMs: 10_000,
} as const;
