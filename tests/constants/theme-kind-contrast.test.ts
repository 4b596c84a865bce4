import { theme } from '../../constants/theme';
import { DIAGNOSIS_KINDS } from '../../shared/diagnosis-kinds';

/** WCAG 2.2's relative luminance of an sRGB colour written #RRGGBB (www.w3.org/TR/WCAG22/#dfn-relative-luminance). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const v = parseInt(hex.slice(i, i + 2), 16) / 255;
    return v <= 0.04045 ? v / 12.92 : ((v + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}
/** WCAG 2.2's contrast ratio (www.w3.org/TR/WCAG22/#dfn-contrast-ratio). */
const contrast = (a: string, b: string) => {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
};

describe('diagnosis kind inks', () => {
  it.each(DIAGNOSIS_KINDS)('%s has an ink of at least 4.5:1 on the panel and on the paper', (kind) => {
    const ink = theme.kindInk[kind];
    expect(ink).toMatch(/^#[0-9A-F]{6}$/i);
    expect(contrast(ink, theme.color.panel)).toBeGreaterThanOrEqual(4.5);
    expect(contrast(ink, theme.color.paper)).toBeGreaterThanOrEqual(4.5);
  });

  it('gives every kind an ink of its own', () => {
    expect(new Set(DIAGNOSIS_KINDS.map((k) => theme.kindInk[k])).size).toBe(DIAGNOSIS_KINDS.length);
  });
});
