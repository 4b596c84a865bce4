/**
 * The contrast ratio of two sRGB colours written `#RRGGBB`, as WCAG 2.x defines it (Understanding
 * WCAG 2.2, "contrast ratio" and "relative luminance": (L1 + 0.05) / (L2 + 0.05), L1 the lighter;
 * each channel linearised with the 0.04045 threshold of IEC 61966-2-1, then weighted 0.2126, 0.7152
 * and 0.0722). 1 for equal colours, 21 for black on white.
 */
export function contrastRatio(a: string, b: string): number {
  const [light, dark] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x) as [number, number];
  return (light + 0.05) / (dark + 0.05);
}

function relativeLuminance(hex: string): number {
  const match = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!match) throw new Error(`contrastRatio takes #RRGGBB colours, not ${JSON.stringify(hex)}`);
  const [r, g, b] = match.slice(1).map((channel) => {
    const s = parseInt(channel, 16) / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  }) as [number, number, number];
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}
