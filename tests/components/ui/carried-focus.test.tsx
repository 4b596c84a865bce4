import { act, fireEvent, render, screen } from '@testing-library/react';
import { useState } from 'react';
import { ActionButton } from '../../../components/ui/action-button';
import { carriedFocus } from '../../../components/ui/carried-focus';
import { TextField } from '../../../components/ui/text-field';

/** A form whose every submit mounts it afresh, as a filter kept in the address does. */
function Remounting({ carries }: { carries: boolean }) {
  const [round, setRound] = useState(0);
  const [text, setText] = useState('');
  return (
    <div key={round}>
      <TextField
        label="Suite"
        value={text}
        onChangeText={setText}
        onSubmitEditing={() => setRound(round + 1)}
        carriesFocus={carries}
      />
      <ActionButton label="Apply filters" onPress={() => setRound(round + 1)} carriesFocus={carries} />
      <span data-testid="round">{round}</span>
    </div>
  );
}

describe('carriedFocus', () => {
  afterEach(() => jest.useRealTimers());

  it('gives a carried name once, and only to that name', () => {
    carriedFocus.carry('Class: any');
    expect(carriedFocus.take('Suite')).toBe(false);
    expect(carriedFocus.take('Class: any')).toBe(true);
    expect(carriedFocus.take('Class: any')).toBe(false);
  });

  it('forgets a name no screen took within 5 s, so a later screen never takes focus uninvited', () => {
    jest.useFakeTimers({ now: new Date('2026-12-05T10:00:00Z') });
    carriedFocus.carry('Suite');
    jest.setSystemTime(new Date('2026-12-05T10:00:05.001Z'));
    expect(carriedFocus.take('Suite')).toBe(false);
  });

  it('keeps the focus in a text field whose Enter mounts the form afresh', () => {
    render(<Remounting carries />);
    const field = screen.getByLabelText('Suite');
    act(() => field.focus());
    fireEvent.keyDown(field, { key: 'Enter', code: 'Enter', keyCode: 13 });
    expect(screen.getByTestId('round').textContent).toBe('1');
    expect(screen.getByLabelText('Suite')).not.toBe(field);
    expect(document.activeElement).toBe(screen.getByLabelText('Suite'));
  });

  it('keeps the focus on a button whose press mounts the form afresh', () => {
    render(<Remounting carries />);
    fireEvent.click(screen.getByRole('button', { name: 'Apply filters' }));
    expect(screen.getByTestId('round').textContent).toBe('1');
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Apply filters' }));
  });

  it('leaves the focus alone for controls that do not carry it', () => {
    render(<Remounting carries={false} />);
    fireEvent.click(screen.getByRole('button', { name: 'Apply filters' }));
    expect(screen.getByTestId('round').textContent).toBe('1');
    expect(document.activeElement).toBe(document.body);
  });
});
