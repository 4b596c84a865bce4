import { fireEvent, render, screen } from '@testing-library/react';
import { ConfirmAction } from '../../../components/ui/confirm-action';

function renderRevoke(onConfirm = jest.fn()) {
  render(
    <ConfirmAction
      label="Revoke"
      accessibilityLabel="Revoke token ci-main"
      question="Revoke ci-main? Jobs that use it stop at once."
      confirmLabel="Yes, revoke"
      onConfirm={onConfirm}
    />,
  );
  return onConfirm;
}

describe('ConfirmAction', () => {
  it('takes no focus when the screen opens', () => {
    renderRevoke();
    expect(document.activeElement).toBe(document.body);
  });

  it('asks first and moves the focus onto the harmless answer, so a second Enter revokes nothing', () => {
    const onConfirm = renderRevoke();
    fireEvent.click(screen.getByRole('button', { name: 'Revoke token ci-main' }));
    expect(screen.getByText('Revoke ci-main? Jobs that use it stop at once.')).toBeTruthy();
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Cancel' }));
    expect(onConfirm).not.toHaveBeenCalled();
  });

  it('gives the focus back to the asking button when the question is put away', () => {
    renderRevoke();
    fireEvent.click(screen.getByRole('button', { name: 'Revoke token ci-main' }));
    fireEvent.click(screen.getByRole('button', { name: 'Cancel' }));
    expect(screen.queryByText(/Jobs that use it/)).toBeNull();
    expect(document.activeElement).toBe(screen.getByRole('button', { name: 'Revoke token ci-main' }));
  });

  it('does it once confirmed', () => {
    const onConfirm = renderRevoke();
    fireEvent.click(screen.getByRole('button', { name: 'Revoke token ci-main' }));
    fireEvent.click(screen.getByRole('button', { name: 'Yes, revoke' }));
    expect(onConfirm).toHaveBeenCalledTimes(1);
  });
});
