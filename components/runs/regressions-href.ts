import type { Href } from 'expo-router';
import { failuresPath } from '../../shared/failures-path';

/** The failure table filtered to one run's regressions (newest first, as the table always opens). */
export function regressionsHref(run: string): Href {
  return failuresPath({ run, status: 'new' });
}
