/** Bad input to a command (unknown flag, target or function, a malformed box): the command exits 2. */
export class BadInput extends Error {
  override name = 'BadInput';
}
