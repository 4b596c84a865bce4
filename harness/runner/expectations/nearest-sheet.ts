import type { Point } from '../../reference/continuation/continuation-path';
import { modInverse } from './mod-inverse';
import type { RegularBranch } from './regular-branch';
import { pointText } from '../formats/point-text';

/**
 * The sheet k whose value C·P·e^{2πiνk} is nearest the continued value F (P: the principal
 * g^ν at the point, in doubles). The continued value only has to tell sheets apart, so doubles
 * do; a ratio F/(C·P) that is no value of e^{2πiνk} at all is an error naming the point.
 */
export function nearestSheet(
  branch: Pick<RegularBranch, 'CDouble' | 'nu' | 'nuDouble' | 'nuText' | 'branch'>,
  F: Point,
  P: Point,
  where: string,
): number {
  const Cd = branch.CDouble;
  const d: Point = [Cd[0] * P[0] - Cd[1] * P[1], Cd[0] * P[1] + Cd[1] * P[0]];
  const m2 = d[0] * d[0] + d[1] * d[1];
  const rho: Point = [(F[0] * d[0] + F[1] * d[1]) / m2, (F[1] * d[0] - F[0] * d[1]) / m2];
  if (branch.nu.im.isZero()) {
    const a = branch.nu.re.num;
    const b = branch.nu.re.den;
    if (b === 1n) return 0;
    const x = (Math.atan2(rho[1], rho[0]) * Number(b)) / (2 * Math.PI);
    const m = Math.round(x);
    if (Math.abs(x - m) > 0.2 || Math.abs(Math.hypot(...rho) - 1) > 1e-3) {
      throw new Error(
        `the continued value at ${where} is no value of (${branch.branch.g})^(${branch.nuText.re}) (ratio ${pointText(rho)})`,
      );
    }
    const inv = modInverse(((a % b) + b) % b, b);
    let k = Number((((BigInt(m) * inv) % b) + b) % b);
    if (k > Number(b) / 2) k -= Number(b);
    return k;
  }
  const [nuRe, nuIm] = branch.nuDouble;
  const k = Math.round(-Math.log(Math.hypot(...rho)) / (2 * Math.PI * nuIm));
  const f: Point = [
    Math.exp(-2 * Math.PI * nuIm * k) * Math.cos(2 * Math.PI * nuRe * k),
    Math.exp(-2 * Math.PI * nuIm * k) * Math.sin(2 * Math.PI * nuRe * k),
  ];
  if (Math.hypot(f[0] - rho[0], f[1] - rho[1]) > 1e-3 * Math.hypot(...f))
    throw new Error(`the continued value at ${where} is no value of the branch (ratio ${pointText(rho)})`);
  return k;
}
