/**
 * Constants and reduction tables in fixed point, one set per working level.
 *
 * A level F means values are bigints scaled by 2^F. Kernels ask for p correct bits
 * and work at F = p + GUARD rounded up to a multiple of 32, so tables are shared
 * between nearby precisions. Each table entry is computed with 32 extra bits and
 * truncated, so it is within one unit of 2^−F.
 *
 * The tables reduce every series argument to |d| ≤ 1/128 (seven bits per factor,
 * fourteen per term of an odd series), so a 160-bit series needs ~12 terms
 * instead of ~30 without them.
 */
export class FixedTables {
  /** Extra bits beyond the requested precision; covers the ≤ 2^5 ulps a series accumulates and a 2^−8 result floor. */
  static readonly GUARD = 24;

  private static readonly cache = new Map<number, FixedTables>();
  private static piMaster: { bits: number; value: bigint } = { bits: 0, value: 0n };
  private static ln2Master: { bits: number; value: bigint } = { bits: 0, value: 0n };

  readonly one: bigint;
  /** ln(1 + j/64) for j = −32…32, indexed j + 32. */
  readonly logTable: bigint[] = [];
  /** atan(j/64) for j = 0…64. */
  readonly atanTable: bigint[] = [];
  /** sin(j/64), cos(j/64) for j = 0…51. */
  readonly sinTable: bigint[] = [];
  readonly cosTable: bigint[] = [];
  /** exp(j/64) for j = −32…32, indexed j + 32. */
  readonly expTable: bigint[] = [];
  /** 1/n! for n = 0…N. */
  readonly inverseFactorial: bigint[] = [];
  /** 1/(2i+1) for i = 0…N. */
  readonly inverseOdd: bigint[] = [];

  private constructor(readonly F: number) {
    const G = F + 32;
    const one = 1n << BigInt(G);
    this.one = 1n << BigInt(F);
    const down = (v: bigint) => v >> 32n;
    const terms = Math.ceil(F / 2) + 8;
    let f = one;
    for (let n = 0; n <= terms; n++) {
      if (n > 0) f /= BigInt(n);
      this.inverseFactorial.push(down(f));
      this.inverseOdd.push(down(one / BigInt(2 * n + 1)));
    }
    // ln(1 + j/64) by steps from j = 0: ln((64 + j)/(64 + j − 1)) = 2 atanh(1/(127 + 2j)), a
    // series in a ratio below 1/63 (ln(1 + j/64) = 2 atanh(j/(128 + j)) directly converged at
    // ratios up to 1/5: 50 of 152 ms at F = 4,160). 32 steps each way add at most 32·G/12 units of
    // 2^−G, below 2^−16 units of 2^−F for F ≤ 2^20.
    const logs = new Array<bigint>(65).fill(0n);
    for (let j = 1; j <= 32; j++) logs[32 + j] = (logs[31 + j] as bigint) + 2n * atanhRatio(1n, BigInt(127 + 2 * j), G);
    for (let j = -1; j >= -32; j--)
      logs[32 + j] = (logs[33 + j] as bigint) - 2n * atanhRatio(1n, BigInt(129 + 2 * j), G);
    for (let j = -32; j <= 32; j++) {
      this.logTable.push(down(logs[32 + j] as bigint));
      this.expTable.push(down(expRatio(BigInt(j), 64n, G)));
    }
    // atan(j/64) = atan((j − 1)/64) + atan(64/(4096 + j² − j)) (the difference formula of atan),
    // each step a series in a ratio below 1/64 with small-integer steps. Halving j/64 three times
    // with square roots at full precision cost two thirds of a table's build (133 of 243 ms at
    // F = 4,160). The 63 steps add at most 63·G/12 units of 2^−G, below 2^−16 units of 2^−F for
    // F ≤ 2^20.
    const quarterPi = FixedTables.pi(G) >> 2n;
    let atan = 0n;
    for (let j = 0; j <= 64; j++) {
      if (j > 0 && j < 64) atan += atanRatio(64n, BigInt(4096 + j * j - j), G);
      this.atanTable.push(down(j === 64 ? quarterPi : atan));
    }
    for (let j = 0; j <= 51; j++) {
      const [s, c] = sinCosRatio(BigInt(j), 64n, G);
      this.sinTable.push(down(s));
      this.cosTable.push(down(c));
    }
  }

  /** The fixed-point level used for `bits` correct bits. */
  static levelFor(bits: number): number {
    return Math.ceil((bits + FixedTables.GUARD) / 32) * 32;
  }

  static at(F: number): FixedTables {
    let t = FixedTables.cache.get(F);
    if (!t) {
      t = new FixedTables(F);
      FixedTables.cache.set(F, t);
    }
    return t;
  }

  /** trunc(π · 2^bits), by Machin's formula π = 16 atan(1/5) − 4 atan(1/239) (common practice). */
  static pi(bits: number): bigint {
    if (FixedTables.piMaster.bits < bits) {
      const G = bits + 64;
      const value = 16n * atanInverse(5n, G) - 4n * atanInverse(239n, G);
      FixedTables.piMaster = { bits: G, value };
    }
    return FixedTables.piMaster.value >> BigInt(FixedTables.piMaster.bits - bits);
  }

  /** trunc(ln 2 · 2^bits), as 2 atanh(1/3) (common practice). */
  static ln2(bits: number): bigint {
    if (FixedTables.ln2Master.bits < bits) {
      const G = bits + 64;
      FixedTables.ln2Master = { bits: G, value: 2n * atanhRatio(1n, 3n, G) };
    }
    return FixedTables.ln2Master.value >> BigInt(FixedTables.ln2Master.bits - bits);
  }
}

/** atanh(a/b) · 2^G for |a/b| < 1 by its power series. */
function atanhRatio(a: bigint, b: bigint, G: number): bigint {
  if (a === 0n) return 0n;
  let term = (a << BigInt(G)) / b;
  let sum = 0n;
  const a2 = a * a;
  const b2 = b * b;
  for (let k = 1n; term !== 0n; k += 2n) {
    sum += term / k;
    term = (term * a2) / b2;
  }
  return sum;
}

/** atan(a/b) · 2^G for 0 ≤ a/b < 1 by its alternating series. */
function atanRatio(a: bigint, b: bigint, G: number): bigint {
  let term = (a << BigInt(G)) / b;
  let sum = 0n;
  const a2 = a * a;
  const b2 = b * b;
  for (let k = 1n, sign = 1n; term !== 0n; k += 2n, sign = -sign) {
    sum += (sign * term) / k;
    term = (term * a2) / b2;
  }
  return sum;
}

/** atan(1/n) · 2^G by its alternating series. */
function atanInverse(n: bigint, G: number): bigint {
  let term = (1n << BigInt(G)) / n;
  let sum = 0n;
  const n2 = n * n;
  for (let k = 1n, sign = 1n; term !== 0n; k += 2n, sign = -sign) {
    sum += (sign * term) / k;
    term /= n2;
  }
  return sum;
}

/** exp(a/b) · 2^G by Taylor's series (|a/b| ≤ 1/2). */
function expRatio(a: bigint, b: bigint, G: number): bigint {
  let term = 1n << BigInt(G);
  let sum = term;
  for (let n = 1n; term !== 0n; n += 1n) {
    term = (term * a) / (b * n);
    sum += term;
  }
  return sum;
}

/** [sin(a/b), cos(a/b)] · 2^G by Taylor's series (|a/b| < 1). */
function sinCosRatio(a: bigint, b: bigint, G: number): [bigint, bigint] {
  let term = 1n << BigInt(G);
  let s = 0n;
  let c = 0n;
  for (let n = 0n; term !== 0n; n += 1n) {
    const phase = n % 4n;
    if (phase === 0n) c += term;
    else if (phase === 1n) s += term;
    else if (phase === 2n) c -= term;
    else s -= term;
    term = (term * a) / (b * (n + 1n));
  }
  return [s, c];
}
