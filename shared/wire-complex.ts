/**
 * A complex number on the wire (docs/suite-format.md), each part a string so every double survives JSON: the shortest
 * decimal that reads back to the same double, "-0", "inf", "-inf", "nan" (harness values); suite
 * files may also write hex floats, ratios and multiples of π here.
 */
export interface WireComplex {
  re: string;
  im: string;
}
