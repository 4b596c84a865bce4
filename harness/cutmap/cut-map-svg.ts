import type { CutMap } from '../../shared/cut-map';
import { parseDouble } from '../reference/numbers/parse-double';
import type { WireComplex } from '../../shared/wire-complex';

const PLOT = 480;
const MARGIN = 56;
const LEGEND = 150;
const WIDTH = PLOT + 2 * MARGIN;
const HEIGHT = PLOT + 2 * MARGIN + LEGEND;
// Colours come with a second cue each (dash pattern, marker shape, words), so nothing depends on colour alone.
const EXPECTED = '#1f5fbf';
const ON_CUT = '#2b2b2b';
const OFF_CUT = '#c0392b';

const escape = (text: string) =>
  text.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const n = (x: number) => (Math.round(x * 100) / 100).toString();

/** Breaks text into lines of at most `width` characters at spaces. */
function wrap(text: string, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(' ')) {
    if (line && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  return line ? [...lines, line] : lines;
}

/**
 * A cut map as a standalone SVG picture, written by hand (no browser, no drawing package): the
 * box with its axes, the expected cuts as thick blue dashed lines, the observed discontinuities
 * as thin polylines — dark with round markers where they lie on an expected cut, red with ×
 * markers where they do not — an expected cut that was not seen labelled "not seen", and a
 * legend that names each mark in words next to a sample of its line and marker. The verdict
 * and the statement of what was checked are printed under the plot and repeated in <desc>.
 */
export function cutMapSvg(map: CutMap): string {
  const [x0, y0] = [parseDouble(map.box.min.re), parseDouble(map.box.min.im)];
  const [x1, y1] = [parseDouble(map.box.max.re), parseDouble(map.box.max.im)];
  const px = (re: number) => MARGIN + ((re - x0) / (x1 - x0)) * PLOT;
  const py = (im: number) => MARGIN + ((y1 - im) / (y1 - y0)) * PLOT;
  const at = (w: WireComplex) => [px(parseDouble(w.re)), py(parseDouble(w.im))] as const;
  const out: string[] = [];
  const title = `Cut map of ${map.function} for ${map.target}: ${map.verdict === 'matches' ? 'matches the expected cuts' : 'differs from the expected cuts'}`;
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${WIDTH}" height="${HEIGHT}" viewBox="0 0 ${WIDTH} ${HEIGHT}" role="img" aria-labelledby="title desc" font-family="sans-serif" font-size="12">`,
  );
  out.push(`<title id="title">${escape(title)}</title>`);
  out.push(`<desc id="desc">${escape(map.statement)}</desc>`);
  out.push(`<rect x="0" y="0" width="${WIDTH}" height="${HEIGHT}" fill="#ffffff"/>`);
  out.push(`<text x="${MARGIN}" y="${MARGIN - 24}" font-size="14" font-weight="bold">${escape(title)}</text>`);
  out.push(`<rect x="${MARGIN}" y="${MARGIN}" width="${PLOT}" height="${PLOT}" fill="none" stroke="#888888"/>`);
  if (x0 < 0 && x1 > 0)
    out.push(`<line x1="${n(px(0))}" y1="${MARGIN}" x2="${n(px(0))}" y2="${MARGIN + PLOT}" stroke="#cccccc"/>`);
  if (y0 < 0 && y1 > 0)
    out.push(`<line x1="${MARGIN}" y1="${n(py(0))}" x2="${MARGIN + PLOT}" y2="${n(py(0))}" stroke="#cccccc"/>`);
  out.push(`<text x="${MARGIN}" y="${MARGIN + PLOT + 16}">${escape(`${map.box.min.re}`)}</text>`);
  out.push(
    `<text x="${MARGIN + PLOT}" y="${MARGIN + PLOT + 16}" text-anchor="end">${escape(`${map.box.max.re}`)}</text>`,
  );
  out.push(`<text x="${MARGIN - 6}" y="${MARGIN + PLOT}" text-anchor="end">${escape(`${map.box.min.im}i`)}</text>`);
  out.push(`<text x="${MARGIN - 6}" y="${MARGIN + 10}" text-anchor="end">${escape(`${map.box.max.im}i`)}</text>`);
  for (const e of map.expected) {
    const [a, b] = [at(e.from), at(e.to)];
    out.push(
      `<line x1="${n(a[0])}" y1="${n(a[1])}" x2="${n(b[0])}" y2="${n(b[1])}" stroke="${EXPECTED}" stroke-width="5" stroke-dasharray="12 6" stroke-opacity="0.6"><title>expected cut ${escape(e.label)}</title></line>`,
    );
    if (!e.seen)
      out.push(
        `<text x="${n((a[0] + b[0]) / 2)}" y="${n((a[1] + b[1]) / 2 - 10)}" fill="${EXPECTED}" text-anchor="middle">not seen: ${escape(e.label)}</text>`,
      );
  }
  for (const o of map.observed) {
    const colour = o.onExpectedCut ? ON_CUT : OFF_CUT;
    const pts = o.points.map(at);
    out.push(
      `<polyline points="${pts.map(([x, y]) => `${n(x)},${n(y)}`).join(' ')}" fill="none" stroke="${colour}" stroke-width="1.5"/>`,
    );
    for (const [x, y] of pts) {
      out.push(
        o.onExpectedCut
          ? `<circle cx="${n(x)}" cy="${n(y)}" r="2.5" fill="${colour}"/>`
          : `<path d="M${n(x - 3)},${n(y - 3)} L${n(x + 3)},${n(y + 3)} M${n(x - 3)},${n(y + 3)} L${n(x + 3)},${n(y - 3)}" stroke="${colour}" stroke-width="1.5"/>`,
      );
    }
    if (!o.onExpectedCut && pts[0])
      out.push(`<text x="${n(pts[0][0] + 6)}" y="${n(pts[0][1] - 6)}" fill="${OFF_CUT}">unexpected</text>`);
  }
  const ly = MARGIN + PLOT + 36;
  const legend: [string, string][] = [
    [
      `<line x1="0" y1="0" x2="40" y2="0" stroke="${EXPECTED}" stroke-width="5" stroke-dasharray="12 6" stroke-opacity="0.6"/>`,
      'expected cut (reference catalogue): thick dashed line',
    ],
    [
      `<line x1="0" y1="0" x2="40" y2="0" stroke="${ON_CUT}" stroke-width="1.5"/><circle cx="20" cy="0" r="2.5" fill="${ON_CUT}"/>`,
      'discontinuity found on an expected cut: thin line, round markers',
    ],
    [
      `<line x1="0" y1="0" x2="40" y2="0" stroke="${OFF_CUT}" stroke-width="1.5"/><path d="M17,-3 L23,3 M17,3 L23,-3" stroke="${OFF_CUT}" stroke-width="1.5"/>`,
      'discontinuity found off the expected cuts: thin line, × markers, "unexpected"',
    ],
  ];
  legend.forEach(([mark, text], i) => {
    out.push(`<g transform="translate(${MARGIN},${ly + i * 18})">${mark}<text x="50" y="4">${escape(text)}</text></g>`);
  });
  wrap(`${map.verdict === 'matches' ? 'Matches' : 'Differs'}. ${map.statement}`, 88).forEach((line, i) => {
    out.push(`<text x="${MARGIN}" y="${ly + 3 * 18 + 8 + i * 15}" fill="#333333">${escape(line)}</text>`);
  });
  out.push('</svg>');
  return out.join('\n');
}
