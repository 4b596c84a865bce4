import { render, screen } from '@testing-library/react';
import { FormulaText } from '../../../components/ui/formula-text';
import { formulaSpeech } from '../../../components/ui/formula-speech';

describe('FormulaText, to a screen reader', () => {
  it('is a math element named by its spoken form, with the set pieces hidden so nothing is read twice', () => {
    const { container } = render(<FormulaText text="(z^2 - 1)^{1/3}" size={16} />);
    const formula = screen.getByRole('math', {
      name: 'open bracket z squared minus 1 close bracket to the power one third',
    });
    expect(formula.getAttribute('aria-label')).toBe(formulaSpeech('(z^2 - 1)^{1/3}'));
    // What the eye reads is unchanged; every span that sets it is under one aria-hidden part.
    expect(container.textContent).toBe('(z2 − 1)1/3');
    const hidden = formula.querySelector('[aria-hidden="true"]');
    expect(hidden?.textContent).toBe('(z2 − 1)1/3');
    const raised = Array.from(container.querySelectorAll('span')).filter((s) => s.style.verticalAlign === 'top');
    expect(raised.length).toBe(2);
    expect(raised.every((s) => hidden!.contains(s))).toBe(true);
  });

  it('names a rule that quotes typed text by its spoken form too', () => {
    render(<FormulaText text="monodromy e^{2πi·2/3} with -1" variables={false} />);
    expect(
      screen.getByRole('math', { name: 'monodromy e to the power 2 pi i times two thirds end exponent with minus 1' }),
    ).toBeTruthy();
  });

  it('shows a typed subject exactly as typed, to copy, and names it by its spoken form', () => {
    const { container } = render(<FormulaText text="pow(z,z)*pow(z,-z)-1" typed />);
    expect(container.textContent).toBe('pow(z,z)*pow(z,-z)-1');
    const formula = screen.getByRole('math', { name: 'z to the power z times z to the power minus z minus 1' });
    expect(formula.querySelector('[aria-hidden="true"]')?.textContent).toBe('pow(z,z)*pow(z,-z)-1');
  });

  it('stays plain text where there is nothing to set or to say otherwise', () => {
    const { container } = render(<FormulaText text="principal branch of every function" />);
    expect(screen.queryByRole('math')).toBeNull();
    expect(container.innerHTML).toBe('principal branch of every function');
  });
});
