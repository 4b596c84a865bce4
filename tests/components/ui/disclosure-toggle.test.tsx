import { fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { Text } from 'react-native';
import { DisclosureToggle } from '../../../components/ui/disclosure-toggle';
import { theme } from '../../../constants/theme';

function Harness() {
  const [open, setOpen] = useState(false);
  return (
    <>
      <DisclosureToggle open={open} onToggle={() => setOpen(!open)} accessibilityLabel="Show details">
        <Text>{open ? '↑ Hide details' : '↓ Show details'}</Text>
      </DisclosureToggle>
      {open ? <Text>The details</Text> : null}
    </>
  );
}

describe('DisclosureToggle', () => {
  it('is a button under its label that says whether its part is open', () => {
    render(<Harness />);
    const toggle = screen.getByRole('button', { name: 'Show details' });
    expect(toggle.getAttribute('aria-expanded')).toBe('false');
    expect(screen.queryByText('The details')).toBeNull();
    fireEvent.click(toggle);
    expect(toggle.getAttribute('aria-expanded')).toBe('true');
    expect(screen.getByText('The details')).toBeTruthy();
    expect(screen.getByText('↑ Hide details')).toBeTruthy();
  });

  it('is at least one touch target tall and takes the caller’s additions to its box', () => {
    render(
      <DisclosureToggle
        open={false}
        onToggle={() => {}}
        accessibilityLabel="Filters"
        style={{ alignSelf: 'flex-start' }}
      >
        <Text>↓ Filters</Text>
      </DisclosureToggle>,
    );
    const style = getComputedStyle(screen.getByRole('button', { name: 'Filters' }));
    expect(style.minHeight).toBe(`${theme.touch}px`);
    expect(style.borderTopWidth).toBe('1px');
    expect(style.alignSelf).toBe('flex-start');
  });
});
