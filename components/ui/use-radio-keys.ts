import { useRef } from 'react';
import { carriedFocus } from './carried-focus';
import { useMountFocus } from './use-mount-focus';
import type { View } from 'react-native';

/** The keys of the WAI-ARIA radio group pattern and where each moves: a step, or the first or last option. */
const MOVES: Record<string, number | 'first' | 'last'> = {
  ArrowRight: 1,
  ArrowDown: 1,
  ArrowLeft: -1,
  ArrowUp: -1,
  Home: 'first',
  End: 'last',
};

/** The part of a DOM keyboard event the handler reads (react-native-web hands Pressable the DOM's). */
interface KeyEvent {
  key: string;
  preventDefault(): void;
}

/**
 * Keyboard use of a single-choice group (WAI-ARIA Authoring Practices, "Radio Group"): the group is
 * one tab stop, the checked option (or the first, when none is) being the one Tab reaches; the
 * arrow keys move to the next or previous option, wrapping, and choose it; Home and End go to the
 * ends; Space chooses the focused option. Returns the props of the option at an index: spread them
 * on its Pressable. react-native-web lets Space press only a `button`, so a `radio` handles it here.
 *
 * `names`, the options' accessible names, let focus follow a choice onto the screen it mounts
 * (`carriedFocus`): a choice that changes the address pushes a new screen, and there the checked
 * option takes focus, so the arrow keys go on moving through the group.
 */
export function useRadioKeys(
  count: number,
  checked: number,
  choose: (index: number) => void,
  names?: readonly string[],
) {
  const nodes = useRef<(View | null)[]>([]);
  const stop = checked >= 0 && checked < count ? checked : 0;
  const chooseCarrying = (index: number) => {
    const name = names?.[index];
    if (name) carriedFocus.carry(name);
    choose(index);
  };
  // The checked option of a group that a choice mounted afresh takes the focus that choice carried.
  useMountFocus(() => {
    const name = names?.[stop];
    return name && carriedFocus.take(name) ? nodes.current[stop] : null;
  });
  return (index: number) => ({
    ref: (node: View | null) => {
      nodes.current[index] = node;
    },
    tabIndex: index === stop ? (0 as const) : (-1 as const),
    /** A press chooses as Space does, carrying the focus the same way. */
    onPress: () => chooseCarrying(index),
    onKeyDown: (event: KeyEvent) => {
      if (event.key === ' ' || event.key === 'Spacebar') {
        event.preventDefault();
        chooseCarrying(index);
        return;
      }
      const move = MOVES[event.key];
      if (move === undefined || count === 0) return;
      event.preventDefault();
      const next = move === 'first' ? 0 : move === 'last' ? count - 1 : (index + move + count) % count;
      chooseCarrying(next);
      nodes.current[next]?.focus();
    },
  });
}
