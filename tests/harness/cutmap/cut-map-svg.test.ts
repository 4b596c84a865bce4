import type { CutMap } from '../../../shared/cut-map';
import { cutMapSvg } from '../../../harness/cutmap/cut-map-svg';

/** A cut map built by hand for the picture's layout (invented data, as in the demo). */
const map: CutMap = {
  target: 'lib@1 <test>',
  function: 'sqrt',
  box: { min: { re: '-4', im: '-4' }, max: { re: '4', im: '4' } },
  columns: 81,
  rows: 81,
  verdict: 'differs',
  statement: 'Evidence from a grid. Not a certification of the library.',
  observed: [
    {
      points: [
        { re: '-4', im: '0' },
        { re: '-0.1', im: '0' },
      ],
      onExpectedCut: true,
    },
    {
      points: [
        { re: '0.1', im: '0' },
        { re: '4', im: '0' },
      ],
      onExpectedCut: false,
    },
  ],
  expected: [
    { label: '(-inf, 0]', from: { re: '0', im: '0' }, to: { re: '-4', im: '0' }, coverage: 1, seen: true },
    { label: '[0, 1]·i', from: { re: '0', im: '0' }, to: { re: '0', im: '1' }, coverage: 0, seen: false },
  ],
  notFinite: 0,
};

describe('cutMapSvg', () => {
  const svg = cutMapSvg(map);

  it('is one svg element with an accessible title and a description that carries the statement', () => {
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.trimEnd().endsWith('</svg>')).toBe(true);
    expect(svg).toContain(
      '<title id="title">Cut map of sqrt for lib@1 &lt;test&gt;: differs from the expected cuts</title>',
    );
    expect(svg).toContain('<desc id="desc">Evidence from a grid. Not a certification of the library.</desc>');
  });

  it('draws expected cuts dashed, discontinuities on them with round markers and those off them with crosses and a word', () => {
    expect(svg.match(/stroke-dasharray="12 6"/g)).toHaveLength(3); // two cuts and the legend sample
    expect(svg.match(/<circle /g)).toHaveLength(3); // two crossings on the cut and the legend sample
    expect(svg.match(/<path d="M/g)).toHaveLength(3);
    expect(svg).toContain('>unexpected</text>');
    expect(svg).toContain('not seen: [0, 1]·i');
  });

  it('names every mark of the legend in words', () => {
    for (const words of ['thick dashed line', 'thin line, round markers', 'thin line, × markers'])
      expect(svg).toContain(words);
  });

  it('maps the box onto the plot with the imaginary axis upwards', () => {
    // The box −4…4 on a 480-pixel plot with a 56-pixel margin: re −4 at x = 56, re 4 at x = 536; im 0 at y = 296; re −0.1 at x = 290.
    expect(svg).toContain('<polyline points="56,296 290,296"');
  });
});
