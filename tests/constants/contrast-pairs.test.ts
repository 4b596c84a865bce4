import { contrastRatio } from '../../constants/contrast-ratio';
import { CONTRAST_PAIRS } from '../../constants/contrast-pairs';
import { theme } from '../../constants/theme';

describe('contrastRatio (WCAG 2.x relative luminance)', () => {
  it('gives 21 for black on white, 1 for a colour on itself, and the same either way round', () => {
    expect(contrastRatio('#000000', '#FFFFFF')).toBeCloseTo(21, 10);
    expect(contrastRatio('#5B6570', '#5B6570')).toBe(1);
    expect(contrastRatio('#2E6B5E', '#FFFDF8')).toBe(contrastRatio('#FFFDF8', '#2E6B5E'));
  });

  it('matches the published ratio of mid grey #767676 on white, 4.54:1 (the lightest grey that passes AA)', () => {
    expect(contrastRatio('#767676', '#FFFFFF')).toBeCloseTo(4.54, 2);
  });
});

describe('the palette', () => {
  const rows = CONTRAST_PAIRS.flatMap(({ what, fronts, grounds, minimum }) =>
    fronts.flatMap((front) => grounds.map((ground) => ({ what, front, ground, minimum }))),
  );

  it.each(rows)('$what: $front on $ground reaches $minimum:1', ({ front, ground, minimum }) => {
    expect(contrastRatio(theme.color[front], theme.color[ground])).toBeGreaterThanOrEqual(minimum);
  });
});

describe('the inks of the diagnosis kinds', () => {
  // A kind's word is written in its ink on the same grounds as any text.
  const grounds = CONTRAST_PAIRS.find((p) => p.what === 'text on the light grounds')!.grounds;
  const rows = Object.entries(theme.kindInk).flatMap(([kind, ink]) => grounds.map((ground) => ({ kind, ink, ground })));

  it.each(rows)('$kind ($ink) on $ground reaches 4.5:1', ({ ink, ground }) => {
    expect(contrastRatio(ink, theme.color[ground])).toBeGreaterThanOrEqual(4.5);
  });
});
