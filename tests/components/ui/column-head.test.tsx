import { render, screen } from '@testing-library/react';
import { ColumnHead } from '../../../components/ui/column-head';
import { theme } from '../../../constants/theme';

describe('ColumnHead', () => {
  it('writes its heading small, in capitals and spaced out, and keeps the column width it is given', () => {
    render(<ColumnHead style={{ flex: 3 }}>E-mail</ColumnHead>);
    const head = screen.getByText('E-mail');
    const style = getComputedStyle(head);
    expect(style.textTransform).toBe('uppercase');
    expect(style.letterSpacing).toBe('0.8px');
    expect(style.fontSize).toBe(`${theme.size.small}px`);
    expect(style.fontFamily).toContain(theme.font.medium);
    expect(style.flexGrow).toBe('3');
  });

  it('is a column header for assistive tech when asked to be', () => {
    render(
      <>
        <ColumnHead role="columnheader">Status</ColumnHead>
        <ColumnHead>Name</ColumnHead>
      </>,
    );
    expect(screen.getByRole('columnheader', { name: 'Status' })).toBeTruthy();
    expect(screen.queryByRole('columnheader', { name: 'Name' })).toBeNull();
  });
});
