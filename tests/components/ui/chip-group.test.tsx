import { act, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { ChipGroup } from '../../../components/ui/chip-group';

const OPTIONS = [
  { value: 'bug', text: 'bug' },
  { value: 'convention', text: 'convention difference' },
  { value: 'accepted', text: 'accepted deviation' },
] as const;

type Verdict = (typeof OPTIONS)[number]['value'];

/** A group whose every choice mounts it afresh, as a filter kept in the address does (a new screen per change). */
function Remounting({ initial }: { initial: Verdict | undefined }) {
  const [value, setValue] = useState<Verdict | undefined>(initial);
  return <ChipGroup key={value ?? '(none)'} label="Verdict" options={OPTIONS} value={value} onChange={setValue} />;
}

function Harness({ initial }: { initial: Verdict | undefined }) {
  const [value, setValue] = useState<Verdict | undefined>(initial);
  return <ChipGroup label="Verdict" options={OPTIONS} value={value} onChange={setValue} />;
}

const radios = () => screen.getAllByRole('radio');
const checked = () => radios().filter((r) => r.getAttribute('aria-checked') === 'true');

describe('ChipGroup', () => {
  it('is a radio group with one tab stop: the checked chip', () => {
    render(<Harness initial="convention" />);
    expect(screen.getByRole('radiogroup', { name: 'Verdict' })).toBeTruthy();
    expect(radios().map((r) => r.getAttribute('tabindex'))).toEqual(['-1', '0', '-1']);
    expect(checked().map((r) => r.getAttribute('aria-label'))).toEqual(['Verdict: convention difference']);
  });

  it('draws its label above the chips, or none when a column heading names them, and keeps the names either way', () => {
    const { rerender } = render(
      <ChipGroup label="Verdict" groupLabel="Verdict of failure 7" options={OPTIONS} value="bug" onChange={() => {}} />,
    );
    expect(screen.getByText('Verdict')).toBeTruthy();
    rerender(
      <ChipGroup
        label="Verdict"
        groupLabel="Verdict of failure 7"
        options={OPTIONS}
        value="bug"
        onChange={() => {}}
        labelHidden
      />,
    );
    expect(screen.queryByText('Verdict')).toBeNull();
    expect(screen.getByRole('radiogroup', { name: 'Verdict of failure 7' })).toBeTruthy();
    expect(radios().map((r) => r.getAttribute('aria-label'))).toEqual([
      'Verdict: bug',
      'Verdict: convention difference',
      'Verdict: accepted deviation',
    ]);
  });

  it('makes the first chip the tab stop when nothing is chosen, and chooses nothing by itself', () => {
    render(<Harness initial={undefined} />);
    expect(radios().map((r) => r.getAttribute('tabindex'))).toEqual(['0', '-1', '-1']);
    expect(checked()).toEqual([]);
  });

  it('moves and chooses with the arrow keys, wrapping at the ends, and takes focus along', () => {
    render(<Harness initial="bug" />);
    fireEvent.keyDown(radios()[0]!, { key: 'ArrowRight' });
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: convention difference');
    expect(document.activeElement).toBe(radios()[1]);
    fireEvent.keyDown(radios()[1]!, { key: 'ArrowDown' });
    fireEvent.keyDown(radios()[2]!, { key: 'ArrowRight' });
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: bug');
    fireEvent.keyDown(radios()[0]!, { key: 'ArrowLeft' });
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: accepted deviation');
    expect(document.activeElement).toBe(radios()[2]);
    expect(radios().map((r) => r.getAttribute('tabindex'))).toEqual(['-1', '-1', '0']);
  });

  it('goes to the first and last chip with Home and End', () => {
    render(<Harness initial="convention" />);
    fireEvent.keyDown(radios()[1]!, { key: 'End' });
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: accepted deviation');
    fireEvent.keyDown(radios()[2]!, { key: 'Home' });
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: bug');
  });

  it('chooses the focused chip with Space', () => {
    render(<Harness initial={undefined} />);
    fireEvent.keyDown(radios()[2]!, { key: ' ' });
    expect(checked().map((r) => r.getAttribute('aria-label'))).toEqual(['Verdict: accepted deviation']);
  });

  it('keeps the focus on the chosen chip when the choice mounts the group afresh, so the arrow keys go on', () => {
    render(<Remounting initial="bug" />);
    const first = radios()[0]!;
    act(() => first.focus());
    fireEvent.keyDown(first, { key: 'ArrowRight' });
    // A new node: the group was mounted again, and its checked chip took the focus the choice carried.
    expect(radios()[1]).not.toBe(first);
    expect(document.activeElement).toBe(radios()[1]);
    fireEvent.keyDown(radios()[1]!, { key: 'ArrowRight' });
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: accepted deviation');
    expect(document.activeElement).toBe(radios()[2]);
  });

  it('keeps the focus on a chip chosen by a press when the choice mounts the group afresh', () => {
    render(<Remounting initial={undefined} />);
    fireEvent.click(radios()[2]!);
    expect(checked()[0]!.getAttribute('aria-label')).toBe('Verdict: accepted deviation');
    expect(document.activeElement).toBe(radios()[2]);
  });

  it('shows no ✓ on any chip: the chosen one carries a drawn ring, not a glyph that means "passed"', () => {
    render(<Harness initial="accepted" />);
    expect(radios().map((r) => r.textContent)).toEqual(['bug', 'convention difference', 'accepted deviation']);
  });
});
