import type { Href } from 'expo-router';

/** The failure table filtered to one suite × target of one run: `/failures?run=…&suite=…&target=…`. */
export function failuresHref(run: string, suite: string, target: string): Href {
  return `/failures?${new URLSearchParams({ run, suite, target }).toString()}`;
}
