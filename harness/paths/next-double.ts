/**
 * The next double after x towards +∞ (direction 1) or −∞ (direction −1), stepping
 * through the bit pattern: from ±0 the next one up is 5e-324 (the least subnormal).
 */
export function nextDouble(x: number, direction: 1 | -1): number {
  if (Number.isNaN(x)) return x;
  if (x === 0) return direction * Number.MIN_VALUE;
  if (x === direction * Infinity) return x;
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  const bits = view.getBigUint64(0);
  // Away from zero means one more in the magnitude bits; towards zero one less.
  view.setBigUint64(0, x > 0 === direction > 0 ? bits + 1n : bits - 1n);
  return view.getFloat64(0);
}
