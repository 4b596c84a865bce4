import { useCallback, useEffect, useState } from 'react';
import { hasSameShape } from './has-same-shape';
import { localStore } from './local-store';

/** Bump when the stored draft's shape changes in a way `hasSameShape` would not catch. */
const FORMAT = 1;

/** How long typing must pause before the draft is written: a keystroke costs nothing (leaving the page writes it at once). */
const WRITE_DELAY_MS = 400;

export interface KeptDraft<T> {
  value: T;
  /** When it was last written, ISO 8601. */
  savedAt: string;
}

/**
 * A form's unsaved work kept on this device under `key`, so a reload, a closed tab or a lost
 * connection does not lose it. `offer` is what was kept when the form opened (when it has the
 * shape of `template`); `current` is written after every pause once `dirty`; `forget` removes it
 * (after a save, or when the author discards it).
 */
export function useKeptDraft<T>(key: string, template: T, current: T, dirty: boolean) {
  const [offer, setOffer] = useState<KeptDraft<T> | null>(() => {
    const raw = localStore()?.getItem(key);
    if (!raw) return null;
    try {
      const parsed = JSON.parse(raw) as { format?: unknown; savedAt?: unknown; value?: unknown };
      if (parsed.format !== FORMAT || typeof parsed.savedAt !== 'string' || !hasSameShape(template, parsed.value))
        return null;
      return { value: parsed.value as T, savedAt: parsed.savedAt };
    } catch {
      return null;
    }
  });

  useEffect(() => {
    if (!dirty) return undefined;
    const write = () => {
      try {
        localStore()?.setItem(
          key,
          JSON.stringify({ format: FORMAT, savedAt: new Date().toISOString(), value: current }),
        );
      } catch {
        // Storage full or refused: the draft still lives in the form until the tab closes.
      }
    };
    const timer = setTimeout(write, WRITE_DELAY_MS);
    // A reload or a closed tab within the pause would lose the changes since the last write (an
    // end-to-end journey on a loaded machine restored a draft from before its branch settings):
    // the page being hidden writes them at once.
    const target = typeof window !== 'undefined' && typeof window.addEventListener === 'function' ? window : null;
    target?.addEventListener('pagehide', write);
    return () => {
      clearTimeout(timer);
      target?.removeEventListener('pagehide', write);
    };
  }, [key, current, dirty]);

  const forget = useCallback(() => {
    setOffer(null);
    localStore()?.removeItem(key);
  }, [key]);
  const dismissOffer = useCallback(() => setOffer(null), []);
  return { offer, forget, dismissOffer };
}
