/** A complex number as the CLI writes it. */
export interface WireComplex {
  re: string;
  im: string;
}
