/**
 * The IEEE 754-2019 exceptions (§7.4 overflow, §7.5 underflow) a `reference` answer names in its
 * `flags` when rounding a part of the exact value to binary64 raised them: "overflow" when the
 * value is finite and rounds to ±∞, "underflow" when it is non-zero, below 2^−1022 in magnitude,
 * and not exactly a double (it rounds to a subnormal or a signed zero). docs/suite-format.md,
 * "The reference request".
 */
export const REFERENCE_FLAGS = ['overflow', 'underflow'] as const;

export type ReferenceFlag = (typeof REFERENCE_FLAGS)[number];
