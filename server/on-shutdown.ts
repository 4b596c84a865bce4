import { describeError } from './database/describe-error';

/** Longest a process waits for its parts to stop after SIGTERM or SIGINT before it exits anyway. */
const GRACE_MS = 10_000;

/** On SIGTERM or SIGINT, runs `stop` once and exits; exits after the grace period if stopping hangs. */
export function onShutdown(stop: () => Promise<unknown>): void {
  let stopping = false;
  const shutdown = () => {
    if (stopping) return;
    stopping = true;
    setTimeout(() => process.exit(0), GRACE_MS);
    stop().then(
      () => process.exit(0),
      (err: unknown) => {
        console.error('[sheetkeeper] stopping failed', describeError(err));
        process.exit(1);
      },
    );
  };
  process.on('SIGTERM', shutdown);
  process.on('SIGINT', shutdown);
}
