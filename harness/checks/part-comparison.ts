/** How one part (re or im) of a library value compares with the reference double. */
export interface PartComparison {
  ulps: number;
  /** Both are zeros of opposite signs. */
  zeroSignDiffers: boolean;
  /** One is NaN or infinite and the other is not the same. */
  finitenessDiffers: boolean;
}
