import { render, screen } from '@testing-library/react';
import { StyleSheet, View } from 'react-native';
import { CHIP_BOX_STYLE } from '../../../components/ui/chip-box-style';
import { theme } from '../../../constants/theme';

const styles = StyleSheet.create({ chip: { ...CHIP_BOX_STYLE, backgroundColor: theme.color.panel } });

describe('CHIP_BOX_STYLE', () => {
  it('draws a ruled, rounded chip at least 44 px tall with its words centred', () => {
    render(<View testID="chip" style={styles.chip} />);
    const style = getComputedStyle(screen.getByTestId('chip'));
    expect(style.minHeight).toBe('44px');
    expect(style.justifyContent).toBe('center');
    expect(style.paddingLeft).toBe(`${theme.space(3)}px`);
    expect(style.borderTopWidth).toBe('1px');
    expect(style.borderTopLeftRadius).toBe(`${theme.radius}px`);
  });

  it('leaves the background and the on state to the chip that uses it', () => {
    expect(CHIP_BOX_STYLE).not.toHaveProperty('backgroundColor');
  });
});
