/** The sign-exact comparison of one library value with the reference. */
export interface ValueCheck {
  pass: boolean;
  /** The larger of the two parts' ulp distances. */
  ulps: number;
  relativeError: number;
  zeroSignDiffers: ('re' | 'im')[];
  finitenessDiffers: boolean;
}
