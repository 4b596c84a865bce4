/** What fixes a principal value of one catalogue function: its definition, Annex G clause, and Kahan's side of each cut. */
export interface FunctionRule {
  /** The definition of the principal branch. */
  definition: string;
  /** The ISO C Annex G clause that fixes values on the cut and special values under signed zeros. */
  annexG: string;
  /** Which side each cut belongs to under counter-clockwise continuity. */
  counterClockwise: string;
}
