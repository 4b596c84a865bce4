import { render } from '@testing-library/react';
import { formulaPieces, type FormulaPiece } from '../../../components/ui/formula-pieces';
import { FormulaText } from '../../../components/ui/formula-text';

/** Pieces as compact text: ^{raised}, _{lowered}, *italic*. */
const shown = (pieces: FormulaPiece[]) =>
  pieces
    .map((p) => {
      const t = p.italic ? `*${p.text}*` : p.text;
      return p.place === 'sup' ? `^{${t}}` : p.place === 'sub' ? `_{${t}}` : t;
    })
    .join('');

describe('formulaPieces', () => {
  it.each([
    ['(z^2 - 1)^(1/3)', '(*z*^{2} − 1)^{1/3}'],
    ['(z^2 - 1)^{1/3}', '(*z*^{2} − 1)^{1/3}'],
    ['e^{2πi·2/3}', 'e^{2πi·2/3}'],
    ['principal·e^(2πiνk)', 'principal·e^{2πi}^{*νk*}'],
    ['f(z0) = -1', '*f*(*z*_{0}) = −1'],
    ['log(z^13) at x^13', 'log(*z*^{13}) at *x*^{13}'],
    ['pow(z, 2/5) * exp(z)', 'pow(*z*, 2/5) · exp(*z*)'],
    ['e^{±4π}', 'e^{±4π}'],
    ['pow(z,z)*pow(z,-z)-1', 'pow(*z*,*z*)·pow(*z*,−*z*)−1'],
    ['(1 − z²)^½ + iz', '(1 − *z*²)^{½} + iz'],
  ])('sets %s as maths', (text, expected) => {
    expect(shown(formulaPieces(text))).toBe(expected);
  });

  it('leaves words, hyphenated words, exponent notation and run ids as they are', () => {
    expect(shown(formulaPieces('counter-clockwise continuity at 1e-9, a well-known rule'))).toBe(
      'counter-clockwise continuity at 1e-9, a well-known rule',
    );
    expect(shown(formulaPieces('as in "Run 37e7ec6f" or 0x1p-3'))).toBe('as in "Run 37e7ec6f" or 0x1p-3');
  });

  it('raises exponents only, every other character as typed, when told not to set variables', () => {
    expect(shown(formulaPieces('with -1 at z0 the value is multiplied by e^{2πi·2/3}', { variables: false }))).toBe(
      'with -1 at z0 the value is multiplied by e^{2πi·2/3}',
    );
    expect(formulaPieces('with -1 at z0', { variables: false })).toEqual([
      { text: 'with -1 at z0', place: 'line', italic: false },
    ]);
  });

  it('keeps a lone caret that raises nothing', () => {
    expect(shown(formulaPieces('a ^ b'))).toBe('a ^ b');
  });
});

describe('FormulaText', () => {
  it('raises an exponent in a smaller size and never shows the caret', () => {
    const { container } = render(<FormulaText text="(z^2 - 1)^{1/3}" size={16} />);
    expect(container.textContent).toBe('(z2 − 1)1/3');
    const raised = Array.from(container.querySelectorAll('span')).filter((s) => s.style.verticalAlign === 'top');
    expect(raised.map((s) => s.textContent)).toEqual(['2', '1/3']);
    expect(raised.every((s) => s.style.fontSize === '12px')).toBe(true);
    const italic = Array.from(container.querySelectorAll('span')).filter((s) => s.style.fontStyle === 'italic');
    expect(italic.map((s) => s.textContent)).toEqual(['z']);
  });
});
