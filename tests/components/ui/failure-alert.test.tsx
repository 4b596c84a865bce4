import { render, screen } from '@testing-library/react';
import { FailureAlert } from '../../../components/ui/failure-alert';
import { theme } from '../../../constants/theme';

describe('FailureAlert', () => {
  it('announces the refusal as an alert behind a cross', () => {
    render(<FailureAlert message="That name is taken." />);
    expect(screen.getByRole('alert').textContent).toBe('❌ That name is taken.');
  });

  it('writes the mark it is given and takes the caller’s additions to its strip', () => {
    render(<FailureAlert message="Not allowed." glyph="×" style={{ marginBottom: theme.space(2) }} />);
    const alert = screen.getByRole('alert');
    expect(alert.textContent).toBe('× Not allowed.');
    const style = getComputedStyle(alert);
    expect(style.marginBottom).toBe(`${theme.space(2)}px`);
    expect(style.paddingTop).toBe(`${theme.space(3)}px`);
    expect(style.fontFamily).toContain(theme.font.medium);
  });
});
