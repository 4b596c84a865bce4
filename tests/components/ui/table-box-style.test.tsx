import { render, screen } from '@testing-library/react';
import { StyleSheet, View } from 'react-native';
import { TABLE_BOX_STYLE } from '../../../components/ui/table-box-style';
import { theme } from '../../../constants/theme';

const styles = StyleSheet.create({ table: TABLE_BOX_STYLE });

describe('TABLE_BOX_STYLE', () => {
  it('frames a table in a ruled, rounded box that clips its rows to the corners', () => {
    render(<View testID="table" style={styles.table} />);
    const style = getComputedStyle(screen.getByTestId('table'));
    expect(style.borderTopWidth).toBe('1px');
    expect(style.borderTopLeftRadius).toBe(`${theme.radius}px`);
    expect([style.overflowX, style.overflowY]).toEqual(['hidden', 'hidden']);
    expect(style.paddingTop).toBe('0px');
  });
});
