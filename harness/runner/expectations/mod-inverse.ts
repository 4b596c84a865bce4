/** a⁻¹ mod m in [0, m), by the extended Euclidean algorithm; a RangeError when a and m are not coprime. */
export function modInverse(a: bigint, m: bigint): bigint {
  let [r0, r1] = [a, m];
  let [s0, s1] = [1n, 0n];
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  if (r0 !== 1n) throw new RangeError(`${a} has no inverse mod ${m}`);
  return ((s0 % m) + m) % m;
}
