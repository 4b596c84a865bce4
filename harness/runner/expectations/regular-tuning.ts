/** The fixed choices of regular-branch expectations, shared by their steps. */
export const REGULAR_TUNING = {
  /** Cache kind of the branch's value at a point. */
  kindValue: 0,
  /** Cache kind of the value continued from the other side of the nearest cut. */
  kindOtherSide: 2,
  /** Added to a kind: the marker that the branch refused that point. */
  kindRefused: 15,
  /** Within this distance (relative to max(1, |z|)) of a cut, the continuation aims at a probe point this far off the cut on the chosen side. */
  probe: 1e-6,
  /** Within this distance of a cut, a failing point also gets the other side's value as an alternative (straddle offsets go to 1e-3). */
  sideReach: 2e-3,
  /** Working precision of the final product P(z)·C·e^{2πiνk}. */
  bits: 192,
  /** The continuation engine is asked for at most this many values of t at once. */
  maxAt: 1000,
} as const;
