import { useEffect } from 'react';

/**
 * Focuses, once and only on mount, the element `target` answers with (null: none). For a control
 * that appears in place of the one that had the focus: the screen a filter change mounts
 * (`carriedFocus`), or an ask-first question's answer. Later renders never move the focus.
 */
export function useMountFocus(target: () => { focus(): void } | null | undefined): void {
  useEffect(() => {
    target()?.focus();
    // Once, on mount: a control that is already on screen never takes the focus by re-rendering.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
}
