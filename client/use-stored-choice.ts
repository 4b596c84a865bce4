import { useCallback, useState } from 'react';
import { localStore } from './local-store';

/**
 * A list of choices remembered in local storage under `key` (e.g. the table's columns).
 * What was stored is kept only where it names known options, so a renamed column cannot
 * leave the table empty.
 */
export function useStoredChoice<T extends string>(
  key: string,
  options: readonly T[],
  fallback: readonly T[],
): [T[], (next: T[]) => void] {
  const [value, setValue] = useState<T[]>(() => {
    const raw = localStore()?.getItem(key);
    if (!raw) return [...fallback];
    try {
      const parsed: unknown = JSON.parse(raw);
      const known = Array.isArray(parsed) ? options.filter((o) => parsed.includes(o)) : [];
      return known.length > 0 ? known : [...fallback];
    } catch {
      return [...fallback];
    }
  });
  const set = useCallback(
    (next: T[]) => {
      const ordered = options.filter((o) => next.includes(o));
      setValue(ordered);
      try {
        localStore()?.setItem(key, JSON.stringify(ordered));
      } catch {
        // Storage full or refused: the choice still holds for this session.
      }
    },
    [key, options],
  );
  return [value, set];
}
