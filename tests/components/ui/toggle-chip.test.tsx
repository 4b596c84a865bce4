import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { ToggleChip } from '../../../components/ui/toggle-chip';

function Harness() {
  const [on, setOn] = useState(false);
  return <ToggleChip label="Only regressions" value={on} onChange={setOn} />;
}

describe('ToggleChip', () => {
  it('is a check box that Space toggles on and off', () => {
    render(<Harness />);
    const box = screen.getByRole('checkbox', { name: 'Only regressions' });
    expect(box.getAttribute('aria-checked')).toBe('false');
    fireEvent.keyDown(box, { key: ' ' });
    expect(box.getAttribute('aria-checked')).toBe('true');
    fireEvent.keyDown(box, { key: ' ' });
    expect(box.getAttribute('aria-checked')).toBe('false');
  });

  it('ignores other keys than Space and Enter', () => {
    render(<Harness />);
    const box = screen.getByRole('checkbox', { name: 'Only regressions' });
    fireEvent.keyDown(box, { key: 'a' });
    expect(box.getAttribute('aria-checked')).toBe('false');
  });

  it('carries no glyph for its state: the words are the label alone', () => {
    render(<Harness />);
    expect(screen.getByRole('checkbox').textContent).toBe('Only regressions');
  });
});
