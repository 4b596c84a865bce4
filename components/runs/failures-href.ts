import type { Href } from 'expo-router';
import { failuresPath } from '../../shared/failures-path';

/** The failure table filtered to one suite × target of one run: `/failures?run=…&suite=…&target=…`. */
export function failuresHref(run: string, suite: string, target: string): Href {
  return failuresPath({ run, suite, target });
}
