/** A complex value as two doubles [re, im], zero signs meaningful. */
export type ComplexDouble = readonly [number, number];
