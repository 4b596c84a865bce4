import { queryObject } from './query-object';
import { cutMapRequest } from './cut-map-request';

/**
 * The server's bounds on a cut map, tighter than the command line's (which allows 1001×1001): a
 * 201×201 grid took up to 0.7 s on the installed targets (cmath's asin), 401×401 up to 4.3 s
 * (cmath's log), during which one server process does nothing else. Coordinates stay within
 * ±1000 and a side is at least 1e-6 long, so a cell stays well above the spacing of doubles there.
 */
const MAX_GRID = 201;
const MAX_COORDINATE = 1000;
const MIN_SIDE = 1e-6;

/**
 * Query (GET) or body (POST) of `/api/targets/:name/cut-map`: one function, the box
 * "re0,im0,re1,im1" and the grid "COLUMNSxROWS", with the command line's rules and defaults
 * (shared/schemas/cut-map-request.ts) and the server's bounds on top. The form uses it as well.
 */
export const cutMapQuery = queryObject({
  fn: cutMapRequest.shape.fn,
  box: cutMapRequest.shape.box
    .refine((b) => b.every((x) => Math.abs(x) <= MAX_COORDINATE), {
      error: `needs every coordinate between -${MAX_COORDINATE} and ${MAX_COORDINATE}`,
    })
    .refine((b) => b[2]! - b[0]! >= MIN_SIDE && b[3]! - b[1]! >= MIN_SIDE, {
      error: `needs sides of at least ${MIN_SIDE}`,
    }),
  grid: cutMapRequest.shape.grid.refine((g) => g.every((k) => k <= MAX_GRID), {
    error: `allows at most ${MAX_GRID} columns and rows on the server`,
  }),
});
