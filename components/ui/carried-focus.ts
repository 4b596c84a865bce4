/**
 * Keyboard focus carried across a screen that a control's own change mounts afresh. The failure
 * table and the Decisions list keep their filters in the address, and each change pushes a new
 * history entry (so the back button undoes it): the new screen mounts, and the control that made
 * the change (a chip, a text field, a button) is a new node. Without this the focus fell to the
 * page's body, so a radio group's arrow keys moved one step and stopped, and a keyboard user
 * tabbed from the top again after every filter.
 *
 * A control that changes the address calls `carry` with its accessible name; the control of that
 * name on the screen mounted next calls `take` and, when it answers true, focuses itself. The name is taken once and only for a short while, so a later, unrelated screen with a
 * control of the same name never takes focus uninvited.
 */
let carried: { name: string; at: number } | null = null;

/**
 * How long a carried name waits for its screen. A push mounts within a frame or two, but the
 * Decisions list mounts its chips only once the new filter's list has loaded; 5 s covers a loaded phone.
 */
const WAIT_MS = 5000;

export const carriedFocus = {
  carry(name: string): void {
    carried = { name, at: Date.now() };
  },
  /** Whether the control called `name` should take focus now; true at most once per carried name. */
  take(name: string): boolean {
    if (!carried || carried.name !== name || Date.now() - carried.at > WAIT_MS) return false;
    carried = null;
    return true;
  },
};
