import { readFormula } from './read-formula';

/** A run of a formula's text with how it is set: raised (an exponent), lowered (an index) or in italics (a variable). */
export interface FormulaPiece {
  text: string;
  place: 'line' | 'sup' | 'sub';
  italic: boolean;
}

/**
 * The pieces to set of a formula as readFormula reads it (read-formula.ts says what it raises,
 * lowers, sets in italics and turns into a minus sign), with neighbouring terms set alike joined.
 * An index is lowered only when variables are set; with `variables: false` only the raising is
 * done, every character as typed.
 */
export function formulaPieces(text: string, { variables = true }: { variables?: boolean } = {}): FormulaPiece[] {
  const out: FormulaPiece[] = [];
  for (const run of readFormula(text, { variables })) {
    for (const term of run.terms) {
      const place = run.raised ? 'sup' : term.kind === 'index' && variables ? 'sub' : 'line';
      const last = out[out.length - 1];
      if (last && last.place === place && last.italic === term.italic) last.text += term.shown;
      else out.push({ text: term.shown, place, italic: term.italic });
    }
  }
  return out;
}
