import { render, screen } from '@testing-library/react';
import { StyleSheet } from 'react-native';
import { SkText } from '../../../components/ui/sk-text';
import { textVariants } from '../../../components/ui/text-variants';
import { theme } from '../../../constants/theme';

/** jsdom answers colours as rgb(); the theme writes them as hex. */
const rgb = (hex: string) => {
  const n = parseInt(hex.slice(1), 16);
  return `rgb(${n >> 16}, ${(n >> 8) & 255}, ${n & 255})`;
};

const computed = (testID: string) => getComputedStyle(screen.getByTestId(testID));

describe('SkText', () => {
  it("draws each variant in the theme's family, size and colour for it", () => {
    const cases: [keyof typeof textVariants, string, number, string][] = [
      ['body', theme.font.regular, theme.size.body, theme.color.ink],
      ['label', theme.font.medium, theme.size.body, theme.color.ink],
      ['strong', theme.font.bold, theme.size.body, theme.color.ink],
      ['heading', theme.font.bold, theme.size.large, theme.color.ink],
      ['title', theme.font.bold, theme.size.title, theme.color.ink],
      ['caption', theme.font.regular, theme.size.small, theme.color.inkSoft],
      ['smallLabel', theme.font.medium, theme.size.small, theme.color.inkSoft],
      ['mono', theme.font.mono, theme.size.small, theme.color.ink],
      ['monoBody', theme.font.mono, theme.size.body, theme.color.ink],
    ];
    expect(cases.map(([variant]) => variant).sort()).toEqual(Object.keys(textVariants).sort());
    render(
      <>
        {cases.map(([variant]) => (
          <SkText key={variant} variant={variant} testID={variant}>
            {variant}
          </SkText>
        ))}
      </>,
    );
    for (const [variant, family, size, color] of cases) {
      const style = computed(variant);
      expect([variant, style.fontFamily, style.fontSize, style.color]).toEqual([
        variant,
        family,
        `${size}px`,
        rgb(color),
      ]);
    }
  });

  it("takes the tone's colour instead of the variant's, and keeps the variant's family and size", () => {
    render(
      <SkText variant="caption" tone="danger" testID="t">
        × broken
      </SkText>,
    );
    expect(computed('t').color).toBe(rgb(theme.color.danger));
    expect(computed('t').fontFamily).toBe(theme.font.regular);
    expect(computed('t').fontSize).toBe(`${theme.size.small}px`);
  });

  it('lets its own style add to the variant and win where both set a property', () => {
    const extra = StyleSheet.create({ more: { lineHeight: 20, marginTop: 4, color: theme.color.accent } });
    render(
      <SkText variant="body" tone="inkFaint" style={extra.more} testID="t" accessibilityLabel="a note">
        note
      </SkText>,
    );
    const style = computed('t');
    expect([style.lineHeight, style.marginTop, style.color, style.fontFamily]).toEqual([
      '20px',
      '4px',
      rgb(theme.color.accent),
      theme.font.regular,
    ]);
    expect(screen.getByLabelText('a note')).toBe(screen.getByTestId('t'));
  });
});
