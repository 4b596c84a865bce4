import { fireEvent, render, screen } from '@testing-library/react';
import { ValueBits } from '../../../components/failures/value-bits';
import { failureRows } from '../../setup/failure-rows';
import type { WireComplex } from '../../../shared/wire-complex';

describe('ValueBits', () => {
  it('shows the values in decimal and their exact bits only on demand', () => {
    const f = { ...failureRows(1)[0]!, expected: { re: '0.1', im: '-2' }, actual: { re: '0.1', im: '-0' } };
    render(<ValueBits failure={f} />);
    expect(screen.getByText('−4 − 0i')).toBeTruthy();
    expect(screen.queryByText(/0x/)).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Show exact bits' }));
    expect(screen.getByRole('button', { name: 'Hide exact bits' }).getAttribute('aria-expanded')).toBe('true');
    const hex = screen.getAllByText(/^re /).map((el) => el.textContent);
    expect(hex).toEqual([
      're -0x1p+2\nim -0x0p+0',
      're 0x1.999999999999ap-4\nim -0x1p+1',
      're 0x1.999999999999ap-4\nim -0x0p+0',
    ]);
  });

  it('lists both one-sided limits of a point on a cut, named', () => {
    const f = {
      ...failureRows(1)[0]!,
      limits: {
        sides: ['from above (Im z = +0)', 'from below (Im z = −0)'] as [string, string],
        values: [
          { re: '0', im: '2' },
          { re: '0', im: '-2' },
        ] as [WireComplex, WireComplex],
      },
    };
    render(<ValueBits failure={f} />);
    expect(screen.getByText('limit from above (Im z = +0)')).toBeTruthy();
    expect(screen.getByText('limit from below (Im z = −0)')).toBeTruthy();
    expect(screen.queryByText(/Not on a cut/)).toBeNull();
  });
});
