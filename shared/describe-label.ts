import type { Diagnosis } from './diagnosis';
import { DIAGNOSIS_KIND_NAMES } from './diagnosis-kind-names';
import { describeWorstPart } from './describe-worst-part';
import { formatComplexText } from './format-complex-text';
import { formatUlps } from './format-ulps';

const PART = { re: 'real', im: 'imaginary' } as const;
const num = (x: number) => x.toPrecision(2);
const at = (t: number | null) => (t === null ? 'nowhere' : `t ≈ ${Number(t.toPrecision(3))}`);

/** What an inaccurate value lost, in words: per part, and for a part lost to cancellation its absolute error beside |value|. */
function inaccuracy(d: Extract<Diagnosis, { kind: 'inaccurate' }>, style: 'short' | 'long'): string {
  const c = d.cancellation;
  if (c) {
    // A tiny part beside a large value: its ulps say little (4.4e18 for a part that should be 0), the absolute error says what was lost.
    // The sign matters to a reviewer: a tiny part of the wrong sign can put a value outside the
    // principal range (acosh's Re ≥ 0) though the whole value is within an eps.
    const flipped = d.signDiffers && d.part === c.part;
    const lost =
      style === 'short'
        ? `${c.part} lost to cancellation${flipped ? ', opposite sign' : ''}: error ${num(c.absoluteError)} beside |value| ${num(c.magnitude)}`
        : `the ${PART[c.part]} part is lost to cancellation${flipped ? ' and has the opposite sign' : ''}: it is ${num(c.absoluteError)} off, beside a value of size |value| = ${num(c.magnitude)}`;
    return style === 'short' ? lost : `${lost}; relative error of the whole value ${num(d.relativeError)}`;
  }
  const worst = [`${formatUlps(d.ulps)} ulps`, describeWorstPart(d, style)].filter(Boolean).join(' ');
  const parts = d.parts;
  if (style === 'short')
    return parts ? `${worst} (re ${formatUlps(parts.re.ulps)}, im ${formatUlps(parts.im.ulps)})` : worst;
  const perPart = parts
    ? `; per part: real ${formatUlps(parts.re.ulps)} ulps, imaginary ${formatUlps(parts.im.ulps)} ulps`
    : '';
  return `${worst}${perPart}; relative error of the whole value ${num(d.relativeError)}`;
}

/**
 * One label of a failing point in words, the same in the app, the mail and the CSV's readers:
 * `short` is the detail beside the label's chip ("k = 1", "9 ulps in im"), `long` the whole
 * label for mail ("other sheet (k = 1)"), which names the label itself.
 */
export function describeLabel(d: Diagnosis, style: 'short' | 'long'): string {
  const name = DIAGNOSIS_KIND_NAMES[d.kind].name;
  const long = (detail: string) => (detail ? `${name} (${detail})` : name);
  switch (d.kind) {
    case 'other-sheet':
      return style === 'short' ? `k = ${d.k}` : long(`k = ${d.k}`);
    case 'cut-side':
      return style === 'short' ? '' : long('the limit from the other side');
    case 'zero-sign': {
      const where = `${PART[d.part]} part of the ${d.of}`;
      return style === 'short' ? where : long(where);
    }
    case 'misplaced-cut': {
      const where = `library jumps ${at(d.libraryJumpAt)}, expected ${at(d.expectedJumpAt)}${d.confirmed ? '; confirmed by refining between samples' : ''}`;
      return style === 'short' ? where : long(where);
    }
    case 'inaccurate':
      return style === 'short' ? inaccuracy(d, 'short') : long(inaccuracy(d, 'long'));
    case 'not-finite':
      return style === 'short' ? '' : long('an infinite or NaN part where the reference is finite, or the reverse');
    case 'disagreement': {
      const whose = d.otherMatchesReference
        ? 'that value matches the reference, this one does not'
        : 'neither matches the reference';
      return style === 'short'
        ? `with ${d.with}`
        : long(`${d.with} gives ${formatComplexText(d.other)} here; ${whose}`);
    }
    case 'unexplained':
      return style === 'short' ? '' : long(`relative error ${num(d.relativeError)}`);
  }
}
