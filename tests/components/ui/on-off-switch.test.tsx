import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { OnOffSwitch } from '../../../components/ui/on-off-switch';

function Harness() {
  const [on, setOn] = useState(false);
  return (
    <OnOffSwitch
      value={on}
      onChange={setOn}
      accessibilityLabel="Mail me regressions of complex.js"
      onWord="Mail me"
      offWord="Quiet"
    />
  );
}

describe('OnOffSwitch', () => {
  it('says its state in a word beside the switch, so no visible word is missing from its name', () => {
    render(<Harness />);
    const toggle = screen.getByRole('switch', { name: 'Mail me regressions of complex.js' });
    expect(toggle.textContent).toBe('');
    expect(screen.getByText('Quiet')).toBeTruthy();
    fireEvent.click(toggle);
    expect(toggle.getAttribute('aria-checked')).toBe('true');
    expect(screen.getByText('Mail me')).toBeTruthy();
  });

  it('toggles with Space', () => {
    render(<Harness />);
    const toggle = screen.getByRole('switch');
    fireEvent.keyDown(toggle, { key: ' ' });
    expect(toggle.getAttribute('aria-checked')).toBe('true');
    fireEvent.keyDown(toggle, { key: ' ' });
    expect(toggle.getAttribute('aria-checked')).toBe('false');
  });
});
