/** A complex double as [re, im]; zero signs, infinities and NaN are meaningful. */
export type ComplexPair = [number, number];
