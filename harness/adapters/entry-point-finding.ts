/**
 * What one way of building one input delivered, read back from the constructed
 * value before any function ran. Parts are wire strings ("-0", "0", "-4").
 */
export interface EntryPointFinding {
  target: string;
  way: string;
  input: [string, string];
  /** The parts read back, or null when building threw (see `error`). */
  arrived: [string, string] | null;
  /** Both parts arrived with the input's value and zero sign. */
  intact: boolean;
  /** Why `arrived` is null, or a note such as "a plain number: no imaginary part". */
  error?: string;
  note?: string;
}
