/** A cut layout or path refused by validation; the message names the failing loop, branch point or location. */
export class LayoutError extends Error {
  override name = 'LayoutError';
}
