import { render, screen } from '@testing-library/react';
import { ProgressBar } from '../../../components/runs/progress-bar';

describe('ProgressBar', () => {
  it('says "n of m checks" in words and fills the bar by the same fraction', () => {
    render(<ProgressBar done={3} total={8} />);
    expect(screen.getByText('3 of 8 checks · 37%')).toBeTruthy();
    const bar = screen.getByRole('progressbar');
    expect(bar.getAttribute('aria-valuenow')).toBe('3');
    expect(bar.getAttribute('aria-valuemax')).toBe('8');
    expect(bar.getAttribute('aria-valuetext')).toBe('3 of 8 checks');
    expect(screen.getByTestId('progress-fill').style.width).toBe('37.5%');
  });

  it('shows an empty bar for a run with no checks done, and never more than a full one', () => {
    const { rerender } = render(<ProgressBar done={0} total={0} />);
    expect(screen.getByText('0 of 0 checks · 0%')).toBeTruthy();
    expect(screen.getByTestId('progress-fill').style.width).toBe('0%');
    rerender(<ProgressBar done={9} total={8} label="paths" />);
    expect(screen.getByText('9 of 8 paths · 100%')).toBeTruthy();
    expect(screen.getByTestId('progress-fill').style.width).toBe('100%');
  });
});
