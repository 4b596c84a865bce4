import type { Href } from 'expo-router';

/** The failure table filtered to one run's regressions (newest first, as the table always opens). */
export function regressionsHref(run: string): Href {
  return `/failures?${new URLSearchParams({ run, status: 'new' }).toString()}`;
}
