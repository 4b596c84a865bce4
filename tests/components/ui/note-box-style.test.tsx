import { render, screen } from '@testing-library/react';
import { StyleSheet, View } from 'react-native';
import { NOTE_BOX_STYLE } from '../../../components/ui/note-box-style';
import { theme } from '../../../constants/theme';

/** The theme writes colours as hex; jsdom answers rgb() or rgba(): compare the red, green and blue. */
const rgbOf = (hex: string) => {
  const n = parseInt(hex.slice(1), 16);
  return [n >> 16, (n >> 8) & 255, n & 255];
};
const channels = (css: string) => (css.match(/\d+(\.\d+)?/g) ?? []).slice(0, 3).map(Number);

const styles = StyleSheet.create({ note: { ...NOTE_BOX_STYLE, gap: theme.space(2) } });

describe('NOTE_BOX_STYLE', () => {
  it('draws a focus-coloured bar on the left of a padded panel-colour box', () => {
    render(<View testID="note" style={styles.note} />);
    const style = getComputedStyle(screen.getByTestId('note'));
    expect(style.borderLeftWidth).toBe('3px');
    expect(channels(style.borderLeftColor)).toEqual(rgbOf(theme.color.focus));
    expect(channels(style.backgroundColor)).toEqual(rgbOf(theme.color.panel));
    expect(style.paddingTop).toBe(`${theme.space(4)}px`);
    expect(style.borderTopWidth).not.toBe('3px');
  });
});
