/**
 * How a run is named to people: the first 8 hex digits of its id ("Run 37e7ec6f"). The failure
 * table's Run filter accepts this (or any longer prefix) back: shared/schemas/run-id-prefix.ts.
 */
export const SHORT_RUN_ID_LENGTH = 8;

export function shortRunId(id: string): string {
  return id.slice(0, SHORT_RUN_ID_LENGTH);
}
