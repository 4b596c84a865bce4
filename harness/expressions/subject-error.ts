/** A subject refused by the parser or the whitelist; the message names what and where. */
export class SubjectError extends Error {
  override name = 'SubjectError';
}
