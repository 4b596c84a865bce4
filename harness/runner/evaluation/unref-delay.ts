/** Resolves after `ms` without keeping the process alive for it: a bound on a wait, never a reason to wait. */
export function unrefDelay(ms: number): Promise<void> {
  return new Promise((resolve) => {
    const t = setTimeout(resolve, ms) as unknown as { unref?: () => void };
    t.unref?.();
  });
}
