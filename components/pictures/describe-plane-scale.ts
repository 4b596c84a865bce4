import { decadeText } from './decade-text';
import { formatAxisRange } from './format-axis-range';
import type { PlaneFit, PlaneView } from './fit-plane-view';
import { formatPlaneNumber } from './format-plane-number';
import type { PlanePoint } from './plane-picture';

const pointText = (p: PlanePoint) =>
  p.im === 0
    ? formatPlaneNumber(p.re, 6)
    : `${p.re === 0 ? '' : `${formatPlaneNumber(p.re, 6)} ${p.im < 0 ? '\u2212' : '+'} `}${formatPlaneNumber(p.re === 0 ? p.im : Math.abs(p.im), 6)}i`;

/** What the scale of a fitted picture is, in words, for the shown (possibly zoomed) box. */
export function describePlaneScale(fit: PlaneFit, shown: PlaneView): string {
  const s = fit.scale;
  if (s.kind === 'linear') {
    const [re0, re1] = formatAxisRange(s.mid.re + shown.minRe * s.half, s.mid.re + shown.maxRe * s.half);
    const [im0, im1] = formatAxisRange(s.mid.im + shown.minIm * s.half, s.mid.im + shown.maxIm * s.half);
    return `Re ${re0} … ${re1}, Im ${im0} … ${im1}`;
  }
  const from =
    s.centerIs === 'branch point' ? `the branch point ${pointText(s.center)}` : `${pointText(s.center)} on the cut`;
  const rings = s.rings.map((r) => decadeText(r.exponent)).join(', ');
  return `distance from ${from}, log scale (rings at ${rings}); directions from it are true`;
}
