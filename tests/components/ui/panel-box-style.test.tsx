import { render, screen } from '@testing-library/react';
import { StyleSheet, View } from 'react-native';
import { PANEL_BOX_STYLE } from '../../../components/ui/panel-box-style';
import { theme } from '../../../constants/theme';

/** The theme writes colours as hex; jsdom answers rgb() or rgba(): compare the red, green and blue. */
const rgbOf = (hex: string) => {
  const n = parseInt(hex.slice(1), 16);
  return [n >> 16, (n >> 8) & 255, n & 255];
};
const channels = (css: string) => (css.match(/\d+(\.\d+)?/g) ?? []).slice(0, 3).map(Number);

const styles = StyleSheet.create({ box: { ...PANEL_BOX_STYLE, gap: theme.space(2) } });

describe('PANEL_BOX_STYLE', () => {
  it('draws a ruled, rounded box on the panel colour with the card padding', () => {
    render(<View testID="box" style={styles.box} />);
    const style = getComputedStyle(screen.getByTestId('box'));
    expect(channels(style.backgroundColor)).toEqual(rgbOf(theme.color.panel));
    expect(style.borderTopWidth).toBe('1px');
    expect(channels(style.borderTopColor)).toEqual(rgbOf(theme.color.rule));
    expect(style.borderTopLeftRadius).toBe(`${theme.radius}px`);
    expect(style.paddingTop).toBe(`${theme.space(4)}px`);
    expect(style.paddingLeft).toBe(`${theme.space(4)}px`);
  });

  it('leaves the gap between children to the card that uses it', () => {
    expect(PANEL_BOX_STYLE).not.toHaveProperty('gap');
  });
});
